import { beforeEach, describe, expect, it, vi } from 'vitest';

// Electron's binary is absent here (STACK.md): the dialog module is replaced by a scripted one.
const answers: unknown[] = [];
const calls: unknown[][] = [];
vi.mock('electron', () => ({
  BrowserWindow: class {},
  dialog: {
    showOpenDialog: async (...args: unknown[]) => (calls.push(args), answers.shift()),
    showSaveDialog: async (...args: unknown[]) => (calls.push(args), answers.shift()),
    showMessageBox: async (...args: unknown[]) => (calls.push(args), answers.shift()),
  },
}));

const { nativeDialogs } = await import('../../../electron/nativeDialogs.ts');

beforeEach(() => {
  answers.length = 0;
  calls.length = 0;
});

describe('nativeDialogs', () => {
  it('opens one Passline document, attached to the window', async () => {
    const win = { id: 1 };
    answers.push({ canceled: false, filePaths: ['/d/a.passline'] });
    const path = await nativeDialogs(() => win as never).pickOpenPath();
    expect(path).toBe('/d/a.passline');
    expect(calls[0]?.[0]).toBe(win);
    expect(calls[0]?.[1]).toMatchObject({ properties: ['openFile'], filters: [{ name: 'Passline document', extensions: ['passline'] }] });
  });

  it('answers null when the user cancels', async () => {
    answers.push({ canceled: true, filePaths: [] }, { canceled: true, filePath: '' });
    const d = nativeDialogs(() => null);
    expect(await d.pickOpenPath()).toBeNull();
    expect(await d.pickSavePath('a.passline', { name: 'x', extensions: ['passline'] })).toBeNull();
  });

  it('offers the suggested name and filter when saving', async () => {
    answers.push({ canceled: false, filePath: '/d/b.passline' });
    const filter = { name: 'Passline document', extensions: ['passline'] };
    expect(await nativeDialogs(() => null).pickSavePath('b.passline', filter)).toBe('/d/b.passline');
    expect(calls[0]?.[0]).toMatchObject({ defaultPath: 'b.passline', filters: [filter] });
  });
});

describe('nativeDialogs: questions', () => {
  it('maps the buttons of the changed-on-disk question to choices, naming the file', async () => {
    const d = nativeDialogs(() => null);
    answers.push({ response: 0 }, { response: 1 }, { response: 2 });
    const when = new Date(2024, 4, 6, 7, 8);
    expect([await d.confirmOverwrite('r.passline', when), await d.confirmOverwrite('r.passline', when), await d.confirmOverwrite('r.passline', when)]).toEqual(['overwrite', 'saveAs', 'cancel']);
    const options = calls[0]?.[0] as { message: string; cancelId: number; buttons: string[] };
    expect(options.message).toContain('r.passline was changed by another program');
    expect(options.buttons[options.cancelId]).toBe('Cancel');
  });

  it('asks save / close without saving / keep editing, and a shorter question when the state is unknown', async () => {
    const d = nativeDialogs(() => null);
    answers.push({ response: 0 }, { response: 1 }, { response: 2 }, { response: 0 }, { response: 1 });
    expect([await d.askClose('a.passline'), await d.askClose('a.passline'), await d.askClose('a.passline')]).toEqual(['save', 'discard', 'cancel']);
    expect([await d.askClose(null), await d.askClose(null)]).toEqual(['discard', 'cancel']);
    expect((calls[0]?.[0] as { message: string }).message).toBe('Save the changes to a.passline before closing?');
    expect((calls[3]?.[0] as { buttons: string[] }).buttons).toEqual(['Close Anyway', 'Keep Window Open']);
  });
});
