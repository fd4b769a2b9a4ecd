import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEFAULT_WINDOW, parseWindowState, placeWindow } from '../../../electron/windowState.ts';
import { loadWindowState, saveWindowState, trackWindowState, windowStateFile } from '../../../electron/windowStateStore.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-window-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const laptop = { x: 0, y: 0, width: 1440, height: 875 };
const monitorRight = { x: 1440, y: 0, width: 2560, height: 1415 };

describe('placeWindow', () => {
  it('reopens where the window was when that place is still on a screen', () => {
    const saved = { bounds: { x: 1600, y: 100, width: 1300, height: 900 }, maximized: false };
    expect(placeWindow(saved, [laptop, monitorRight])).toEqual(saved);
  });

  it('falls back to the default size, centred, when the screen it was on is gone', () => {
    const saved = { bounds: { x: 1600, y: 100, width: 1300, height: 900 }, maximized: true };
    expect(placeWindow(saved, [laptop])).toEqual({ bounds: DEFAULT_WINDOW, maximized: true });
    expect(placeWindow(null, [laptop])).toEqual({ bounds: DEFAULT_WINDOW, maximized: false });
  });

  it('shrinks and moves a window larger than its screen so all of it is reachable', () => {
    const saved = { bounds: { x: -100, y: 20, width: 3000, height: 2000 }, maximized: false };
    expect(placeWindow(saved, [laptop]).bounds).toEqual({ x: 0, y: 0, width: 1440, height: 875 });
  });

  it('does not keep a window whose title bar is only a sliver on screen', () => {
    const saved = { bounds: { x: 1420, y: 100, width: 800, height: 600 }, maximized: false };
    expect(placeWindow(saved, [laptop]).bounds).toEqual(DEFAULT_WINDOW);
  });
});

describe('window state file', () => {
  it('round-trips through the data folder and ignores damaged content', async () => {
    const state = { bounds: { x: 10, y: 20, width: 900, height: 700 }, maximized: true };
    await saveWindowState(folder, state);
    expect(await loadWindowState(folder)).toEqual(state);
    writeFileSync(windowStateFile(folder), '{"bounds":{"x":"left"},"maximized":false}');
    expect(await loadWindowState(folder)).toBeNull();
    expect(parseWindowState({ bounds: { x: 0, y: 0, width: -5, height: 10 }, maximized: false })).toBeNull();
    expect(parseWindowState({ bounds: { x: 0, y: 0, width: Number.NaN, height: 10 }, maximized: false })).toBeNull();
  });

  it('records the normal (not maximised) bounds when the window closes', async () => {
    let onClose: () => void = () => undefined;
    const win = { on: (_event: 'close', listener: () => void) => void (onClose = listener), getNormalBounds: () => ({ x: 5, y: 6, width: 700, height: 500 }), isMaximized: () => true };
    trackWindowState(win, folder, () => undefined);
    onClose();
    await vi.waitFor(async () => expect(await loadWindowState(folder)).toEqual({ bounds: { x: 5, y: 6, width: 700, height: 500 }, maximized: true }));
  });
});
