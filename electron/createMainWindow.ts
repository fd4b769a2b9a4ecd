import { BrowserWindow } from 'electron';
import { windowOptions } from './windowOptions.ts';
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

/** Opens the app's window on the built renderer (from disk, never from the network). */
export function createMainWindow(files: AppFiles, placement: WindowPlacement = { bounds: {}, maximized: false }): BrowserWindow {
  const win = new BrowserWindow(windowOptions(files.preload, placement.bounds));
  win.once('ready-to-show', () => {
    if (placement.maximized) win.maximize();
    win.show();
  });
  void win.loadFile(files.rendererIndex);
  return win;
}
