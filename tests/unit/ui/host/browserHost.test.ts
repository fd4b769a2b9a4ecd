import { afterEach, describe, expect, it, vi } from 'vitest';
import { createBrowserHost, MAX_OPEN_BYTES } from '../../../../ui/host/browserHost.ts';
import type { SavePickerOptions, SavePickerWindow } from '../../../../ui/host/savePicker.ts';

type HostWindow = Window & SavePickerWindow;

/** Makes the next file-input click behave like the user picking `file` (or dismissing with null). */
function userPicks(file: File | null) {
  return vi.spyOn(HTMLInputElement.prototype, 'click').mockImplementation(function (this: HTMLInputElement) {
    if (file === null) return void this.dispatchEvent(new Event('cancel'));
    Object.defineProperty(this, 'files', { value: [file] });
    this.dispatchEvent(new Event('change'));
  });
}

/** A file handle that keeps what is written to it. */
function fakeHandle(name: string) {
  const written: Blob[] = [];
  const handle = { name, createWritable: async () => ({ write: async (b: Blob) => void written.push(b), close: async () => undefined }) };
  return { handle: handle as unknown as FileSystemFileHandle, written };
}

const { createObjectURL, revokeObjectURL } = URL;
afterEach(() => {
  vi.restoreAllMocks();
  Object.assign(URL, { createObjectURL, revokeObjectURL });
});

describe('browser host: open', () => {
  it('reads the picked file as text, accepting .passline files', async () => {
    const click = userPicks(new File(['{"format":"passline"}'], 'a.passline'));
    const opened = await createBrowserHost().openDocument();
    expect(opened).toEqual({ name: 'a.passline', text: '{"format":"passline"}' });
    expect((click.mock.contexts[0] as HTMLInputElement).accept).toContain('.passline');
    expect(document.querySelector('input[type=file]')).toBeNull();
  });

  it('resolves to null when the picker is dismissed', async () => {
    userPicks(null);
    expect(await createBrowserHost().openDocument()).toBeNull();
  });

  it('refuses a file over the size limit before reading it', async () => {
    const big = new File(['x'], 'huge.passline');
    Object.defineProperty(big, 'size', { value: MAX_OPEN_BYTES + 1 });
    userPicks(big);
    await expect(createBrowserHost().openDocument()).rejects.toThrow(/huge\.passline is too large/);
  });
});

describe('browser host: save without a save picker', () => {
  it('downloads the text under the suggested name', async () => {
    const blobs: Blob[] = [];
    URL.createObjectURL = (blob: Blob) => (blobs.push(blob), 'blob:fake');
    URL.revokeObjectURL = () => undefined;
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    const host = createBrowserHost({ document } as HostWindow);
    const saved = await host.saveDocument({ suggestedName: 'doc.passline', text: '{"a":1}' });
    expect(saved).toEqual({ name: 'doc.passline' });
    const anchor = click.mock.contexts[0] as HTMLAnchorElement;
    expect(anchor.download).toBe('doc.passline');
    expect(await blobs[0]?.text()).toBe('{"a":1}');
    expect((await host.hostInfo()).canSaveInPlace).toBe(false);
  });
});

describe('browser host: save with a save picker', () => {
  it('writes to the picked file and later saves back to it without asking', async () => {
    const { handle, written } = fakeHandle('mine.passline');
    const showSaveFilePicker = vi.fn(async (_options: SavePickerOptions) => handle);
    const host = createBrowserHost({ document, showSaveFilePicker } as unknown as HostWindow);
    const first = await host.saveDocument({ suggestedName: 'doc.passline', text: 'one' });
    expect(first?.name).toBe('mine.passline');
    expect(showSaveFilePicker.mock.calls[0]?.[0]).toMatchObject({ suggestedName: 'doc.passline' });
    const second = await host.saveDocument({ suggestedName: 'doc.passline', text: 'two', path: first!.path! });
    expect(second?.path).toBe(first?.path);
    expect(showSaveFilePicker).toHaveBeenCalledTimes(1);
    expect(await Promise.all(written.map((b) => b.text()))).toEqual(['one', 'two']);
  });

  it('resolves to null when the user dismisses the picker', async () => {
    const showSaveFilePicker = async () => { throw new DOMException('dismissed', 'AbortError'); };
    const host = createBrowserHost({ document, showSaveFilePicker } as unknown as HostWindow);
    expect(await host.exportFile({ suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' })).toBeNull();
  });

  it('exports bytes with the matching file type offered', async () => {
    const { handle, written } = fakeHandle('f.png');
    const showSaveFilePicker = vi.fn(async (_options: SavePickerOptions) => handle);
    const host = createBrowserHost({ document, showSaveFilePicker } as unknown as HostWindow);
    await host.exportFile({ suggestedName: 'f.png', data: new Uint8Array([137, 80, 78, 71]), mimeType: 'image/png' });
    expect(showSaveFilePicker.mock.calls[0]?.[0].types[0]?.accept).toEqual({ 'image/png': ['.png'] });
    expect(new Uint8Array(await written[0]!.arrayBuffer())).toEqual(new Uint8Array([137, 80, 78, 71]));
  });
});

describe('browser host: desktop-only abilities', () => {
  it('reads a dropped file, has no recent list, cannot reopen by name and ignores close replies', async () => {
    const host = createBrowserHost({ document } as HostWindow);
    expect(await host.openDroppedFile(new File(['{"a":1}'], 'dropped.passline'))).toEqual({ name: 'dropped.passline', text: '{"a":1}' });
    expect(await host.recentFiles()).toEqual([]);
    await expect(host.openKnownFile('/d/a.passline')).rejects.toThrow(/cannot reopen a file by its name/);
    await expect(host.replyClose({ dirty: true, name: 'a.passline' })).resolves.toBeUndefined();
  });

  it('refuses a dropped file over the size limit', async () => {
    const big = new File(['x'], 'huge.passline');
    Object.defineProperty(big, 'size', { value: MAX_OPEN_BYTES + 1 });
    await expect(createBrowserHost({ document } as HostWindow).openDroppedFile(big)).rejects.toThrow(/huge\.passline is too large/);
  });

  it('keeps the working copy in localStorage and offers it to the next page', async () => {
    window.localStorage.clear();
    await createBrowserHost().autosave({ name: 'route.passline', text: 'draft' });
    expect(await createBrowserHost().recoveryOffer()).toMatchObject({ name: 'route.passline', text: 'draft' });
    window.localStorage.clear();
  });
});
