import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { HOST_COMMAND_CHANNEL, hostChannels } from '../../../ui/host/hostApi.ts';
import { DROP_CHANNEL } from '../../../electron/dropRegistry.ts';

// Electron's binary is absent here (STACK.md): the main process runs against recording
// stand-ins for app, windows, IPC and menus, on a real data folder and real documents.
const folder = mkdtempSync(join(tmpdir(), 'passline-main-'));
const doc = join(folder, 'route.passline');
writeFileSync(doc, '{"title":"route"}');

type Listener = (...args: any[]) => any;
const appEvents = new Map<string, Listener>();
const handlers = new Map<string, Listener>();
const schemes = new Map<string, Listener>();
const windows: FakeWindow[] = [];
const menus: unknown[] = [];
let ready = false;

class FakeContents {
  static next = 1;
  id = FakeContents.next++;
  sent: unknown[][] = [];
  onceListeners = new Map<string, Listener>();
  send(...args: unknown[]) { this.sent.push(args); }
  once(event: string, listener: Listener) { this.onceListeners.set(event, listener); }
  isDestroyed() { return false; }
}
class FakeWindow {
  webContents = new FakeContents();
  events = new Map<string, Listener[]>();
  closes = 0;
  constructor(public options: unknown) { windows.push(this); }
  on(event: string, listener: Listener) { this.events.set(event, [...(this.events.get(event) ?? []), listener]); }
  emit(event: string, ...args: unknown[]) { for (const listener of this.events.get(event) ?? []) listener(...args); }
  once(_event: string, _listener: Listener) {}
  loadURL() { return Promise.resolve(); }
  show() {}
  close() {
    this.closes += 1;
    const event = { defaultPrevented: false, preventDefault() { this.defaultPrevented = true; } };
    this.emit('close', event);
    if (!event.defaultPrevented) this.emit('closed');
  }
  isMinimized() { return false; }
  focus() {}
  getNormalBounds() { return { x: 1, y: 2, width: 800, height: 600 }; }
  isMaximized() { return false; }
  static getAllWindows() { return windows; }
}

vi.mock('electron', () => ({
  app: {
    isPackaged: true,
    name: 'Passline',
    getPath: () => join(folder, 'user-data'),
    setPath: vi.fn(),
    getVersion: () => '0.1.0',
    requestSingleInstanceLock: () => true,
    addRecentDocument: vi.fn(),
    clearRecentDocuments: vi.fn(),
    enableSandbox: vi.fn(),
    quit: vi.fn(),
    isReady: () => ready,
    whenReady: () => ((ready = true), Promise.resolve()),
    on: (event: string, listener: Listener) => void appEvents.set(event, listener),
  },
  BrowserWindow: FakeWindow,
  protocol: { registerSchemesAsPrivileged: vi.fn(), handle: (scheme: string, listener: Listener) => void schemes.set(scheme, listener) },
  ipcMain: { handle: (channel: string, listener: Listener) => void handlers.set(channel, listener), on: (channel: string, listener: Listener) => void handlers.set(channel, listener) },
  Menu: { buildFromTemplate: (template: unknown) => template, setApplicationMenu: (menu: unknown) => void menus.push(menu) },
  screen: { getAllDisplays: () => [{ workArea: { x: 0, y: 0, width: 1920, height: 1080 } }] },
  dialog: { showMessageBox: vi.fn(async () => ({ response: 2 })), showOpenDialog: vi.fn(), showSaveDialog: vi.fn() },
}));

const savedArgv = process.argv;
beforeAll(async () => {
  process.argv = ['/opt/Passline/passline', doc];
  await import('../../../electron/main.ts');
  await vi.waitFor(() => expect(windows).toHaveLength(1));
});
afterAll(() => {
  process.argv = savedArgv;
  rmSync(folder, { recursive: true, force: true });
});

/** Calls an IPC handler as the app's own window would. */
function invoke(channel: string, ...args: unknown[]) {
  const win = windows[0]!;
  const page = 'passline-app://app/index.html';
  const event = { sender: { id: win.webContents.id }, senderFrame: { url: page, parent: null } };
  return handlers.get(channel)!(event, ...args);
}

describe('main process', () => {
  it('serves the renderer from its own scheme, confined to the renderer folder', async () => {
    const serve = schemes.get('passline-app')!;
    expect((await serve({ url: 'passline-app://app/%2e%2e/%2e%2e/package.json' })).status).toBe(404);
    expect((await serve({ url: 'passline-app://app/../../../../../../etc/passwd' })).status).toBe(404);
  });

  it('opens a dropped path only after preload announced it from a real drop, from an app window', async () => {
    await expect(invoke(hostChannels.openDroppedFile, doc)).rejects.toThrow('was not dropped on the window');
    const foreign = { sender: { id: 999 }, senderFrame: { url: 'https://example.invalid/', parent: null } };
    handlers.get(DROP_CHANNEL)!(foreign, [doc]);
    await expect(invoke(hostChannels.openDroppedFile, doc)).rejects.toThrow('was not dropped on the window');
    invoke(DROP_CHANNEL, [doc]);
    expect(await invoke(hostChannels.openDroppedFile, doc)).toMatchObject({ name: 'route.passline', path: doc });
  });

  it('serves every host channel and sets the menu', () => {
    expect([...handlers.keys()].sort()).toEqual([...Object.values(hostChannels), DROP_CHANNEL].sort());
    expect(menus.length).toBeGreaterThan(0);
  });

  it('hands the document from the command line to the page once it has loaded, and lets it be opened', async () => {
    const contents = windows[0]!.webContents;
    expect(contents.sent).toEqual([]);
    contents.onceListeners.get('did-finish-load')!();
    expect(contents.sent).toEqual([[HOST_COMMAND_CHANNEL, { kind: 'openKnown', path: doc }]]);
    expect(await invoke(hostChannels.openKnownFile, doc)).toEqual({ name: 'route.passline', path: doc, text: '{"title":"route"}' });
  });

  it('forwards a second launch\'s document to the running window, and a macOS open-file too', () => {
    expect(windows).toHaveLength(1);
    const contents = windows[0]!.webContents;
    contents.sent.length = 0;
    appEvents.get('second-instance')!({}, ['/opt/Passline/passline', '--flag', 'other.passline'], folder);
    appEvents.get('open-file')!({ preventDefault() {} }, join(folder, 'mac.passline'));
    appEvents.get('open-file')!({ preventDefault() {} }, '/etc/passwd');
    expect(contents.sent).toEqual([
      [HOST_COMMAND_CHANNEL, { kind: 'openKnown', path: join(folder, 'other.passline') }],
      [HOST_COMMAND_CHANNEL, { kind: 'openKnown', path: join(folder, 'mac.passline') }],
    ]);
  });

  it('asks the page before closing and closes once it reports no unsaved changes', async () => {
    const win = windows[0]!;
    win.webContents.sent.length = 0;
    win.close();
    expect(win.webContents.sent).toEqual([[HOST_COMMAND_CHANNEL, { kind: 'closeRequested' }]]);
    await invoke(hostChannels.replyClose, { dirty: false, name: 'route.passline' });
    expect(win.closes).toBe(2);
    await vi.waitFor(() => expect(existsSync(join(folder, 'user-data', 'window-state.json'))).toBe(true));
  });

  it('ends the session cleanly on quit: the running marker goes', async () => {
    expect(existsSync(join(folder, 'user-data', 'recovery', 'session.json'))).toBe(true);
    const event = { preventDefault: vi.fn() };
    appEvents.get('will-quit')!(event);
    expect(event.preventDefault).toHaveBeenCalled();
    await vi.waitFor(() => expect(existsSync(join(folder, 'user-data', 'recovery', 'session.json'))).toBe(false));
  });
});
