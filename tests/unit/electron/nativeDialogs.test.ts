import { beforeEach, describe, expect, it, vi } from 'vitest';

// Electron's binary is absent here (STACK.md): the dialog module is replaced by a scripted one.
const answers: unknown[] = [];
const calls: unknown[][] = [];
vi.mock('electron', () => ({
  BrowserWindow: class {},
  dialog: {
    showOpenDialog: async (...args: unknown[]) => (calls.push(args), answers.shift()),
    showSaveDialog: async (...args: unknown[]) => (calls.push(args), answers.shift()),
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
