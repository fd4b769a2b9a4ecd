import { beforeAll, describe, expect, it, vi } from 'vitest';
import { hostChannels, HOST_GLOBAL } from '../../../ui/host/hostApi.ts';

// Electron's binary is absent here (STACK.md), so the module is replaced by recorders.
const exposed = new Map<string, Record<string, (...args: unknown[]) => unknown>>();
const invoke = vi.fn(async (...args: unknown[]) => args);
vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: (key: string, api: Record<string, (...args: unknown[]) => unknown>) => void exposed.set(key, api) },
  ipcRenderer: { invoke },
}));

beforeAll(async () => {
  await import('../../../electron/preload.ts');
});

describe('preload', () => {
  it('exposes one object, under the host name, with exactly the host methods', () => {
    expect([...exposed.keys()]).toEqual([HOST_GLOBAL]);
    expect(Object.keys(exposed.get(HOST_GLOBAL)!).sort()).toEqual(Object.keys(hostChannels).sort());
  });

  it('forwards each method to its own channel with its arguments', async () => {
    const host = exposed.get(HOST_GLOBAL)!;
    const request = { suggestedName: 'a.passline', text: '{}' };
    expect(await host.saveDocument!(request)).toEqual([hostChannels.saveDocument, request]);
    expect(await host.openDocument!()).toEqual([hostChannels.openDocument]);
    expect(await host.hostInfo!()).toEqual([hostChannels.hostInfo]);
    const exportRequest = { suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' };
    expect(await host.exportFile!(exportRequest)).toEqual([hostChannels.exportFile, exportRequest]);
  });
});
