import { BrowserWindow } from 'electron';
import { windowOptions } from './windowOptions.ts';
import { APP_INDEX_URL } from './appProtocol.ts';
import type { Bounds } from './windowState.ts';

/** Where the built app lives on disk. */
export interface AppFiles {
  preload: string;
  rendererIndex: string;
}

/** Where and how big the window opens. */
export interface WindowPlacement {
  bounds: Partial<Bounds>;
  maximized: boolean;
}

/**
 * Opens the app's window on the built renderer, through the app's own scheme (see
 * appProtocol.ts: files of the renderer folder only; never file:// and never the network).
 */
export function createMainWindow(files: AppFiles, placement: WindowPlacement = { bounds: {}, maximized: false }): BrowserWindow {
  const win = new BrowserWindow(windowOptions(files.preload, placement.bounds));
  win.once('ready-to-show', () => {
    if (placement.maximized) win.maximize();
    win.show();
  });
  void win.loadURL(APP_INDEX_URL);
  return win;
}
