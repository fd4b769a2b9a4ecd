import { describe, expect, it, vi } from 'vitest';
import { createCommandBuffer } from '../../../electron/commandBuffer.ts';
import { CommandSender, type CommandTarget } from '../../../electron/commandSender.ts';
import { HOST_COMMAND_CHANNEL } from '../../../ui/host/hostApi.ts';

function fakeContents() {
  let loaded: () => void = () => undefined;
  const sent: unknown[][] = [];
  const target: CommandTarget = {
    send: (...args) => void sent.push(args),
    once: (_event, listener) => void (loaded = listener),
    isDestroyed: () => false,
  };
  return { target, sent, load: () => loaded() };
}

describe('CommandSender', () => {
  it('holds commands until the page has loaded, then sends them in order on the command channel', () => {
    const sender = new CommandSender();
    sender.send({ kind: 'openKnown', path: '/d/a.passline' });
    const contents = fakeContents();
    sender.attach(contents.target);
    sender.send({ kind: 'save' });
    expect(contents.sent).toEqual([]);
    contents.load();
    sender.send({ kind: 'undo' });
    expect(contents.sent).toEqual([
      [HOST_COMMAND_CHANNEL, { kind: 'openKnown', path: '/d/a.passline' }],
      [HOST_COMMAND_CHANNEL, { kind: 'save' }],
      [HOST_COMMAND_CHANNEL, { kind: 'undo' }],
    ]);
  });

  it('keeps commands for the next window once a window closed', () => {
    const sender = new CommandSender();
    const first = fakeContents();
    sender.attach(first.target);
    first.load();
    sender.detach(first.target);
    sender.send({ kind: 'new' });
    const second = fakeContents();
    sender.attach(second.target);
    second.load();
    expect(first.sent).toEqual([]);
    expect(second.sent).toEqual([[HOST_COMMAND_CHANNEL, { kind: 'new' }]]);
  });
});

describe('createCommandBuffer', () => {
  it('drops and logs malformed commands, and stops delivering after unsubscribe', () => {
    const log = vi.fn();
    const buffer = createCommandBuffer(log);
    const seen: unknown[] = [];
    const stop = buffer.source.subscribe((command) => seen.push(command));
    buffer.receive({ kind: 'export', format: 'exe' });
    buffer.receive({ kind: 'save', extra: 1 });
    buffer.receive({ kind: 'export', format: 'png' });
    stop();
    buffer.receive({ kind: 'save' });
    expect(seen).toEqual([{ kind: 'export', format: 'png' }]);
    expect(log).toHaveBeenCalledTimes(2);
  });
});
