import { join } from 'node:path';
import { readJsonFile, writeJsonFile } from './jsonFile.ts';
import { parseWindowState, type WindowState } from './windowState.ts';

/** Where the window's place is remembered: `window-state.json` in the app's data folder. */
export function windowStateFile(dataFolder: string): string {
  return join(dataFolder, 'window-state.json');
}

/** The remembered window state, or null when there is none or it is damaged. */
export async function loadWindowState(dataFolder: string): Promise<WindowState | null> {
  return parseWindowState(await readJsonFile(windowStateFile(dataFolder)));
}

/** Remembers the window state. */
export async function saveWindowState(dataFolder: string, state: WindowState): Promise<void> {
  await writeJsonFile(windowStateFile(dataFolder), state);
}

/** The parts of a BrowserWindow whose place is remembered. */
export interface PlacedWindow {
  on(event: 'close', listener: () => void): unknown;
  getNormalBounds(): { x: number; y: number; width: number; height: number };
  isMaximized(): boolean;
}

/** Remembers the window's place each time it is asked to close (the last answer is what counts). */
export function trackWindowState(win: PlacedWindow, dataFolder: string, log: (message: string) => void): void {
  win.on('close', () => {
    const state = { bounds: win.getNormalBounds(), maximized: win.isMaximized() };
    saveWindowState(dataFolder, state).catch((error: unknown) => log(`could not remember the window place: ${String(error)}`));
  });
}
