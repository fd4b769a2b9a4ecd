import { app, BrowserWindow, dialog, ipcMain, Menu, protocol, screen } from 'electron';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { APP_INDEX_URL, APP_SCHEME, APP_SCHEME_PRIVILEGES, serveAppFile } from './appProtocol.ts';
import { HOST_COMMAND_CHANNEL } from '../ui/host/hostApi.ts';
import type { HostCommand } from '../ui/host/hostCommand.ts';
import { aboutMessage } from './aboutBox.ts';
import { documentPathsFromArgv } from './argvFiles.ts';
import { CloseGuard } from './closeGuard.ts';
import { CommandSender } from './commandSender.ts';
import { createMainWindow } from './createMainWindow.ts';
import { createDesktopHost } from './desktopHost.ts';
import { hardenContents } from './hardenContents.ts';
import { buildMenuTemplate } from './menuTemplate.ts';
import { nativeDialogs } from './nativeDialogs.ts';
import { PathGrants } from './pathGrants.ts';
import { RecentStore } from './recentStore.ts';
import { RecoveryStore } from './recoveryStore.ts';
import { registerHostIpc } from './registerHostIpc.ts';
import { DropRegistry, DROP_CHANNEL } from './dropRegistry.ts';
import { isAppSender } from './senderCheck.ts';
import { acceptSystemPath } from './systemPath.ts';
import { placeWindow } from './windowState.ts';
import { loadWindowState, trackWindowState } from './windowStateStore.ts';

// Bundled to electron/dist/main.js; the renderer build sits in dist/renderer at the top.
const here = dirname(fileURLToPath(import.meta.url));
const files = { preload: join(here, 'preload.cjs'), rendererIndex: join(here, '..', '..', 'dist', 'renderer', 'index.html') };
const rendererFolder = dirname(files.rendererIndex);
const appUrl = APP_INDEX_URL;
// Before 'ready': the renderer is served from its own privileged scheme, confined to its folder.
protocol.registerSchemesAsPrivileged([APP_SCHEME_PRIVILEGES]);
const log = (message: string) => console.warn(`[passline] ${message}`);
// A separate data folder on request (end-to-end tests, a portable setup); set before any use.
if (process.env.PASSLINE_USER_DATA) app.setPath('userData', process.env.PASSLINE_USER_DATA);
// `electron .` in development puts the app folder before the user's arguments.
const launcherArgs = app.isPackaged ? 1 : 2;

let mainWindow: BrowserWindow | null = null;
let quitting = false;
const appWindowIds = new Set<number>();
const commands = new CommandSender();
const grants = new PathGrants();
const dialogs = nativeDialogs(() => mainWindow);
const recent = new RecentStore(app.getPath('userData'), { add: (path) => app.addRecentDocument(path), clear: () => app.clearRecentDocuments() });
const recovery = new RecoveryStore(join(app.getPath('userData'), 'recovery'));
let closeGuard: CloseGuard | null = null;

/** A document named by the system: granted for opening, then offered to the renderer. */
function openFromSystem(path: unknown): void {
  const accepted = acceptSystemPath(path);
  if (!accepted) return log('ignored a file from the system that is not a .passline document');
  grants.grant(accepted);
  send({ kind: 'openKnown', path: accepted });
}

function send(command: HostCommand): void {
  if (app.isReady()) void ensureWindow();
  commands.send(command);
}

let opening: Promise<void> | null = null;

/** The app's window, opened once however many requests for it arrive while it is being made. */
function ensureWindow(): Promise<void> {
  if (mainWindow) return Promise.resolve();
  opening ??= openWindow().finally(() => { opening = null; });
  return opening;
}

function setMenu(): void {
  Menu.setApplicationMenu(Menu.buildFromTemplate(buildMenuTemplate({
    platform: process.platform,
    appName: app.name,
    recent: recent.list(),
    actions: {
      command: send,
      openRecent: (path) => send({ kind: 'openKnown', path }),
      clearRecent: () => void recent.clear().then(setMenu, (error: unknown) => log(String(error))),
      about: () => void dialog.showMessageBox(aboutMessage('Passline', app.getVersion(), process.versions)),
    },
  })));
}

async function openWindow(): Promise<void> {
  const saved = await loadWindowState(app.getPath('userData'));
  const win = createMainWindow(files, placeWindow(saved, screen.getAllDisplays().map((d) => d.workArea)));
  const id = win.webContents.id;
  appWindowIds.add(id);
  mainWindow = win;
  commands.attach(win.webContents);
  trackWindowState(win, app.getPath('userData'), log);
  const guard = new CloseGuard({
    askRenderer: () => win.webContents.send(HOST_COMMAND_CHANNEL, { kind: 'closeRequested' } satisfies HostCommand),
    askUser: (name) => dialogs.askClose(name),
    requestSave: () => win.webContents.send(HOST_COMMAND_CHANNEL, { kind: 'saveThenClose' } satisfies HostCommand),
    discard: () => recovery.clear(),
    close: () => win.close(),
    timers: { set: (callback, ms) => setTimeout(callback, ms), clear: (handle) => clearTimeout(handle as NodeJS.Timeout) },
  });
  closeGuard = guard;
  win.on('close', (event) => {
    if (!guard.onClose()) event.preventDefault();
  });
  win.on('closed', () => {
    appWindowIds.delete(id);
    commands.detach(win.webContents);
    if (mainWindow === win) mainWindow = null;
    if (closeGuard === guard) closeGuard = null;
    if (quitting) app.quit();
  });
}

if (!app.requestSingleInstanceLock()) {
  // Another Passline is running: it received our command line through 'second-instance'.
  app.quit();
} else {
  app.enableSandbox();
  app.on('web-contents-created', (_event, contents) => hardenContents(contents, log));
  app.on('second-instance', (_event, argv, workingDirectory) => {
    for (const path of documentPathsFromArgv(argv, launcherArgs, workingDirectory)) openFromSystem(path);
    if (mainWindow) {
      if (mainWindow.isMinimized()) mainWindow.restore();
      mainWindow.focus();
    }
  });
  // macOS hands over double-clicked documents this way, possibly before 'ready'.
  app.on('open-file', (event, path) => {
    event.preventDefault();
    openFromSystem(path);
  });
  for (const path of documentPathsFromArgv(process.argv, launcherArgs, process.cwd())) openFromSystem(path);

  const drops = new DropRegistry();
  void app.whenReady().then(async () => {
    protocol.handle(APP_SCHEME, (request) => serveAppFile(rendererFolder, request.url));
    await Promise.all([recent.load(), recovery.begin()]);
    const host = createDesktopHost({
      dialogs,
      grants,
      drops,
      recent,
      recovery,
      onCloseReply: async (reply) => closeGuard?.onReply(reply),
      onRecentChanged: setMenu,
      log,
    });
    registerHostIpc(ipcMain, host, (event) => isAppSender(event, appWindowIds, appUrl), log);
    ipcMain.on(DROP_CHANNEL, (event, paths: unknown) => {
      if (isAppSender(event, appWindowIds, appUrl)) drops.record(paths);
    });
    setMenu();
    await ensureWindow();
    app.on('activate', () => {
      if (BrowserWindow.getAllWindows().length === 0) void ensureWindow();
    });
  });

  app.on('before-quit', () => { quitting = true; });
  let ended = false;
  app.on('will-quit', (event) => {
    if (ended) return;
    // The clean-exit bookkeeping must finish before the process goes.
    event.preventDefault();
    void recovery.end().catch((error: unknown) => log(String(error))).finally(() => {
      ended = true;
      app.quit();
    });
  });
  app.on('window-all-closed', () => {
    if (process.platform !== 'darwin') app.quit();
  });
}
