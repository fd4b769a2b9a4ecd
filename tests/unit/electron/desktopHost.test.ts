import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { chmodSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDesktopHost, type DesktopDialogs } from '../../../electron/desktopHost.ts';
import { PathGrants } from '../../../electron/pathGrants.ts';
import type { FileFilter } from 'electron';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-host-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

/** Dialogs that answer with the given paths in turn (null = cancelled). */
function dialogs(opens: (string | null)[], saves: (string | null)[] = []) {
  return {
    pickOpenPath: vi.fn(async () => opens.shift() ?? null),
    pickSavePath: vi.fn(async (_name: string, _filter: FileFilter) => saves.shift() ?? null),
  } satisfies DesktopDialogs;
}

describe('desktop host', () => {
  it('opens the picked file and may then save back to it without asking', async () => {
    const path = join(folder, 'route.passline');
    writeFileSync(path, '{"old":true}');
    const d = dialogs([path]);
    const host = createDesktopHost(d, new PathGrants());
    expect(await host.openDocument()).toEqual({ name: 'route.passline', path, text: '{"old":true}' });
    expect(await host.saveDocument({ suggestedName: 'route.passline', text: '{"new":true}', path })).toEqual({ name: 'route.passline', path });
    expect(readFileSync(path, 'utf8')).toBe('{"new":true}');
    expect(d.pickSavePath).not.toHaveBeenCalled();
  });

  it('asks where to save when the renderer names a path the user never picked', async () => {
    const elsewhere = join(folder, 'chosen');
    const d = dialogs([], [elsewhere]);
    const host = createDesktopHost(d, new PathGrants());
    const saved = await host.saveDocument({ suggestedName: 'a.passline', text: 'x', path: join(folder, 'not-granted.passline') });
    expect(d.pickSavePath).toHaveBeenCalledWith('a.passline', { name: 'Passline document', extensions: ['passline'] });
    // The dialog answer had no extension; the document extension is added.
    expect(saved).toEqual({ name: 'chosen.passline', path: `${elsewhere}.passline` });
    expect(readFileSync(`${elsewhere}.passline`, 'utf8')).toBe('x');
  });

  it('resolves to null when a dialog is cancelled', async () => {
    const host = createDesktopHost(dialogs([null], [null, null]), new PathGrants());
    expect(await host.openDocument()).toBeNull();
    expect(await host.saveDocument({ suggestedName: 'a.passline', text: 'x' })).toBeNull();
    expect(await host.exportFile({ suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' })).toBeNull();
  });

  it('exports bytes to the picked file with the type\'s extension', async () => {
    const d = dialogs([], [join(folder, 'figure')]);
    const host = createDesktopHost(d, new PathGrants());
    const saved = await host.exportFile({ suggestedName: 'figure.png', data: new Uint8Array([137, 80, 78, 71]), mimeType: 'image/png' });
    expect(saved?.name).toBe('figure.png');
    expect([...readFileSync(join(folder, 'figure.png'))]).toEqual([137, 80, 78, 71]);
    expect(d.pickSavePath.mock.calls[0]?.[1]).toEqual({ name: 'PNG image', extensions: ['png'] });
  });

  it('names the file and the reason when reading fails', async () => {
    const host = createDesktopHost(dialogs([join(folder, 'gone.passline')]), new PathGrants());
    await expect(host.openDocument()).rejects.toThrow('could not read gone.passline (ENOENT)');
  });

  it.skipIf(process.platform === 'win32' || process.getuid?.() === 0)('names the file and the reason when writing fails', async () => {
    chmodSync(folder, 0o500);
    const host = createDesktopHost(dialogs([], [join(folder, 'locked.passline')]), new PathGrants());
    await expect(host.saveDocument({ suggestedName: 'locked.passline', text: 'x' })).rejects.toThrow('could not write locked.passline (EACCES)');
    chmodSync(folder, 0o700);
  });

  it('says it can save in place', async () => {
    expect(await createDesktopHost(dialogs([]), new PathGrants()).hostInfo()).toEqual({ kind: 'desktop', canSaveInPlace: true });
  });
});
