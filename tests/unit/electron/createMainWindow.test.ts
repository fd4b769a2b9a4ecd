import { describe, expect, it, vi } from 'vitest';

// Electron's binary is absent here (STACK.md): a recording BrowserWindow stands in for it.
const created: { options: unknown; loaded: string[]; shown: number; maximized: number; once: Map<string, () => void> }[] = [];
vi.mock('electron', () => ({
  BrowserWindow: class {
    record = { options: undefined as unknown, loaded: [] as string[], shown: 0, maximized: 0, once: new Map<string, () => void>() };
    constructor(options: unknown) {
      this.record.options = options;
      created.push(this.record);
    }
    once(event: string, listener: () => void) { this.record.once.set(event, listener); }
    show() { this.record.shown += 1; }
    maximize() { this.record.maximized += 1; }
    loadURL(url: string) { this.record.loaded.push(url); return Promise.resolve(); }
  },
}));

const { createMainWindow } = await import('../../../electron/createMainWindow.ts');

describe('createMainWindow', () => {
  it('creates a hidden, secure window on the built renderer and shows it once ready', () => {
    createMainWindow({ preload: '/app/electron/dist/preload.cjs', rendererIndex: '/app/dist/renderer/index.html' });
    const win = created[0]!;
    expect(win.options).toMatchObject({ show: false, webPreferences: { preload: '/app/electron/dist/preload.cjs', contextIsolation: true, sandbox: true, nodeIntegration: false } });
    expect(win.loaded).toEqual(['passline-app://app/index.html']); // the app scheme, not file://
    expect(win.shown).toBe(0);
    win.once.get('ready-to-show')!();
    expect(win.shown).toBe(1);
  });

  it('opens at the given place and maximises before showing when it was maximised', () => {
    createMainWindow({ preload: '/p.cjs', rendererIndex: '/i.html' }, { bounds: { x: 5, y: 6, width: 700, height: 500 }, maximized: true });
    const win = created.at(-1)!;
    expect(win.options).toMatchObject({ x: 5, y: 6, width: 700, height: 500 });
    win.once.get('ready-to-show')!();
    expect([win.maximized, win.shown]).toEqual([1, 1]);
  });
});
