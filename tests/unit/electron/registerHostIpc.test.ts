import { describe, expect, it, vi } from 'vitest';
import type { IpcMainInvokeEvent } from 'electron';
import { registerHostIpc } from '../../../electron/registerHostIpc.ts';
import { hostChannels } from '../../../ui/host/hostApi.ts';
import { createFakeHost } from '../ui/host/fakeHost.ts';

type Listener = (event: IpcMainInvokeEvent, ...args: unknown[]) => Promise<unknown>;

function setUp(trusted: boolean) {
  const handlers = new Map<string, Listener>();
  const fake = createFakeHost();
  const log = vi.fn();
  registerHostIpc({ handle: (channel, listener) => void handlers.set(channel, listener) }, fake.host, () => trusted, log);
  const call = (channel: string, ...args: unknown[]) => handlers.get(channel)!({} as IpcMainInvokeEvent, ...args);
  return { handlers, fake, log, call };
}

describe('registerHostIpc', () => {
  it('serves exactly one handler per host method', () => {
    expect([...setUp(true).handlers.keys()].sort()).toEqual(Object.values(hostChannels).sort());
  });

  it('forwards checked arguments to the host', async () => {
    const { fake, call } = setUp(true);
    const saved = await call(hostChannels.saveDocument, { suggestedName: 'a.passline', text: '{}' });
    expect(saved).toEqual({ name: 'a.passline', path: '/fake/a.passline' });
    expect(fake.saved).toEqual([{ suggestedName: 'a.passline', text: '{}' }]);
  });

  it('refuses a foreign sender before looking at the arguments, and logs it', async () => {
    const { fake, call, log } = setUp(false);
    await expect(call(hostChannels.saveDocument, { suggestedName: 'a.passline', text: '{}' })).rejects.toThrow('request refused');
    expect(fake.saved).toEqual([]);
    expect(log).toHaveBeenCalledWith('refused passline:save-document: sender is not an app window');
  });

  it('refuses bad arguments without calling the host, and logs why', async () => {
    const { fake, call, log } = setUp(true);
    await expect(call(hostChannels.exportFile, { suggestedName: 'x.sh', data: '', mimeType: 'image/png' })).rejects.toThrow(/request refused/);
    await expect(call(hostChannels.openDocument, '/etc/passwd')).rejects.toThrow(/expected no arguments/);
    expect(fake.exported).toEqual([]);
    expect(log).toHaveBeenCalledTimes(2);
  });

  it('refuses a made-up dropped file, a malformed autosave and a close reply with a bad flag', async () => {
    const { fake, call, log } = setUp(true);
    await expect(call(hostChannels.openDroppedFile, '')).rejects.toThrow('request refused: path: expected an absolute path');
    await expect(call(hostChannels.autosave, { name: 'a.passline', text: 1 })).rejects.toThrow('request refused: text: expected a string');
    await expect(call(hostChannels.replyClose, { dirty: 'no', name: 'a.passline' })).rejects.toThrow(/dirty: expected true or false/);
    expect(fake.autosaved).toEqual([]);
    expect(fake.closeReplies).toEqual([]);
    expect(log).toHaveBeenCalledTimes(3);
  });

  it('passes a close reply and an autosave through once checked', async () => {
    const { fake, call } = setUp(true);
    await call(hostChannels.replyClose, { dirty: false, name: 'a.passline' });
    await call(hostChannels.autosave, null);
    expect(fake.closeReplies).toEqual([{ dirty: false, name: 'a.passline' }]);
    expect(fake.autosaved).toEqual([null]);
  });
});
