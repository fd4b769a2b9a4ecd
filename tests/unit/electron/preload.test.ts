import { beforeAll, describe, expect, it, vi } from 'vitest';
import { COMMANDS_GLOBAL, HOST_COMMAND_CHANNEL, hostChannels, HOST_GLOBAL, type CommandSource } from '../../../ui/host/hostApi.ts';

// Electron's binary is absent here (STACK.md), so the module is replaced by recorders.
const exposed = new Map<string, unknown>();
const invoke = vi.fn(async (...args: unknown[]) => args);
const channelListeners = new Map<string, (event: unknown, value: unknown) => void>();
const realFile = new File(['{}'], 'dropped.passline');
vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: (key: string, api: unknown) => void exposed.set(key, api) },
  ipcRenderer: { invoke, on: (channel: string, listener: (event: unknown, value: unknown) => void) => void channelListeners.set(channel, listener) },
  // Electron gives a path only for a File backed by a file on disk, '' for one made by script.
  webUtils: { getPathForFile: (file: File) => (file === realFile ? '/home/u/dropped.passline' : '') },
}));

beforeAll(async () => {
  await import('../../../electron/preload.ts');
});

type Methods = Record<string, (...args: unknown[]) => Promise<unknown>>;

describe('preload', () => {
  it('exposes the host, with exactly the host methods, and the command source; nothing else', () => {
    expect([...exposed.keys()].sort()).toEqual([COMMANDS_GLOBAL, HOST_GLOBAL].sort());
    expect(Object.keys(exposed.get(HOST_GLOBAL) as Methods).sort()).toEqual(Object.keys(hostChannels).sort());
    expect(Object.keys(exposed.get(COMMANDS_GLOBAL) as object)).toEqual(['subscribe']);
  });

  it('forwards each method to its own channel with its arguments', async () => {
    const host = exposed.get(HOST_GLOBAL) as Methods;
    const request = { suggestedName: 'a.passline', text: '{}' };
    expect(await host.saveDocument!(request)).toEqual([hostChannels.saveDocument, request]);
    expect(await host.openDocument!()).toEqual([hostChannels.openDocument]);
    expect(await host.hostInfo!()).toEqual([hostChannels.hostInfo]);
    const exportRequest = { suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' };
    expect(await host.exportFile!(exportRequest)).toEqual([hostChannels.exportFile, exportRequest]);
    expect(await host.openKnownFile!('/home/u/a.passline')).toEqual([hostChannels.openKnownFile, '/home/u/a.passline']);
    expect(await host.autosave!(null)).toEqual([hostChannels.autosave, null]);
    expect(await host.replyClose!({ dirty: false, name: 'a.passline' })).toEqual([hostChannels.replyClose, { dirty: false, name: 'a.passline' }]);
    for (const method of ['recentFiles', 'recoveryOffer', 'dismissRecovery'] as const) expect(await host[method]!()).toEqual([hostChannels[method]]);
  });

  it('sends a dropped file as its path only; a made-up File sends an empty path (refused in main)', async () => {
    const host = exposed.get(HOST_GLOBAL) as Methods;
    expect(await host.openDroppedFile!(realFile)).toEqual([hostChannels.openDroppedFile, '/home/u/dropped.passline']);
    expect(await host.openDroppedFile!(new File(['x'], 'fake.passline'))).toEqual([hostChannels.openDroppedFile, '']);
  });

  it('passes on well-formed commands from the main process, held until the app subscribes', () => {
    const receive = channelListeners.get(HOST_COMMAND_CHANNEL)!;
    receive({}, { kind: 'openKnown', path: '/home/u/a.passline' });
    receive({}, { kind: 'rm -rf' });
    const seen: unknown[] = [];
    const stop = (exposed.get(COMMANDS_GLOBAL) as CommandSource).subscribe((command) => seen.push(command));
    receive({}, { kind: 'save' });
    stop();
    receive({}, { kind: 'undo' });
    expect(seen).toEqual([{ kind: 'openKnown', path: '/home/u/a.passline' }, { kind: 'save' }]);
  });
});
