import { app, BrowserWindow, ipcMain } from 'electron';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { createMainWindow } from './createMainWindow.ts';
import { createDesktopHost } from './desktopHost.ts';
import { hardenContents } from './hardenContents.ts';
import { nativeDialogs } from './nativeDialogs.ts';
import { PathGrants } from './pathGrants.ts';
import { registerHostIpc } from './registerHostIpc.ts';
import { isAppSender } from './senderCheck.ts';

// Bundled to electron/dist/main.js; the renderer build sits in dist/renderer at the top.
const here = dirname(fileURLToPath(import.meta.url));
const files = { preload: join(here, 'preload.cjs'), rendererIndex: join(here, '..', '..', 'dist', 'renderer', 'index.html') };
const appUrl = pathToFileURL(files.rendererIndex).href;
const log = (message: string) => console.warn(`[passline] ${message}`);

let mainWindow: BrowserWindow | null = null;
const appWindowIds = new Set<number>();

function openWindow(): void {
  const win = createMainWindow(files);
  const id = win.webContents.id;
  appWindowIds.add(id);
  mainWindow = win;
  win.on('closed', () => {
    appWindowIds.delete(id);
    if (mainWindow === win) mainWindow = null;
  });
}

app.enableSandbox();
app.on('web-contents-created', (_event, contents) => hardenContents(contents, log));

void app.whenReady().then(() => {
  const host = createDesktopHost(nativeDialogs(() => mainWindow), new PathGrants());
  registerHostIpc(ipcMain, host, (event) => isAppSender(event, appWindowIds, appUrl), log);
  openWindow();
  app.on('activate', () => {
    if (BrowserWindow.getAllWindows().length === 0) openWindow();
  });
});

app.on('window-all-closed', () => {
  if (process.platform !== 'darwin') app.quit();
});
