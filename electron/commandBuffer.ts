import type { CommandSource } from '../ui/host/hostApi.ts';
import { parseHostCommand, type HostCommand } from '../ui/host/hostCommand.ts';
import type { Logger } from './hardenContents.ts';

/** Most commands kept while nobody listens (a file opened at start arrives before the app subscribes). */
const MAX_WAITING = 20;

/**
 * The renderer's end of the command channel, living in preload: every message is checked
 * to be a known command (others are logged and dropped), and commands that arrive before
 * the app subscribes wait for it instead of being lost.
 */
export function createCommandBuffer(log: Logger) {
  const listeners = new Set<(command: HostCommand) => void>();
  const waiting: HostCommand[] = [];

  const source: CommandSource = {
    subscribe(listener) {
      listeners.add(listener);
      for (const command of waiting.splice(0)) listener(command);
      return () => void listeners.delete(listener);
    },
  };

  function receive(value: unknown): void {
    const command = parseHostCommand(value);
    if (!command) return log('dropped a malformed host command');
    if (listeners.size === 0) {
      if (waiting.length < MAX_WAITING) waiting.push(command);
      return;
    }
    for (const listener of listeners) listener(command);
  }

  return { source, receive };
}
