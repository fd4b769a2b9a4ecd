import { BrowserWindow } from 'electron';
import { windowOptions } from './windowOptions.ts';

/** Where the built app lives on disk. */
export interface AppFiles {
  preload: string;
  rendererIndex: string;
}

/** Opens the app's window on the built renderer (from disk, never from the network). */
export function createMainWindow(files: AppFiles): BrowserWindow {
  const win = new BrowserWindow(windowOptions(files.preload));
  win.once('ready-to-show', () => win.show());
  void win.loadFile(files.rendererIndex);
  return win;
}
