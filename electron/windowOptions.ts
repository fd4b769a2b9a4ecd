import type { BrowserWindowConstructorOptions } from 'electron';

/**
 * Options of the app's window: the renderer gets no Node, runs sandboxed and isolated from
 * preload, and cannot load insecure or remote content; it reaches the system only through
 * the host object that `preload` exposes.
 */
export function windowOptions(preloadPath: string): BrowserWindowConstructorOptions {
  return {
    width: 1200,
    height: 800,
    minWidth: 640,
    minHeight: 420,
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
