import type { BrowserWindowConstructorOptions } from 'electron';
import { DEFAULT_WINDOW, MIN_WINDOW, type Bounds } from './windowState.ts';

/**
 * Options of the app's window: the renderer gets no Node, runs sandboxed and isolated from
 * preload, and cannot load insecure or remote content; it reaches the system only through
 * the host object that `preload` exposes. `bounds` is the remembered place (see placeWindow);
 * without x and y the system centres the window.
 */
export function windowOptions(preloadPath: string, bounds: Partial<Bounds> = DEFAULT_WINDOW): BrowserWindowConstructorOptions {
  return {
    width: bounds.width ?? DEFAULT_WINDOW.width,
    height: bounds.height ?? DEFAULT_WINDOW.height,
    ...(bounds.x !== undefined && bounds.y !== undefined ? { x: bounds.x, y: bounds.y } : {}),
    minWidth: MIN_WINDOW.width,
    minHeight: MIN_WINDOW.height,
    show: false,
    title: 'Passline',
    backgroundColor: '#f4f5f3',
    webPreferences: {
      preload: preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      experimentalFeatures: false,
      spellcheck: false,
    },
  };
}
