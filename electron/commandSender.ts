import { HOST_COMMAND_CHANNEL } from '../ui/host/hostApi.ts';
import type { HostCommand } from '../ui/host/hostCommand.ts';

/** The parts of a window's WebContents the sender uses. */
export interface CommandTarget {
  send(channel: string, ...args: unknown[]): void;
  once(event: 'did-finish-load', listener: () => void): unknown;
  isDestroyed(): boolean;
}

/**
 * Sends host commands to the app's window over the one command channel. Commands for a
 * window that is still loading (or not there yet) wait until its page has loaded, so a
 * file named on the command line is not lost at start.
 */
export class CommandSender {
  #target: CommandTarget | null = null;
  #ready = false;
  readonly #waiting: HostCommand[] = [];

  /** Directs commands to a window's contents; they flow once its page has loaded. */
  attach(target: CommandTarget): void {
    this.#target = target;
    this.#ready = false;
    target.once('did-finish-load', () => {
      if (this.#target !== target) return;
      this.#ready = true;
      for (const command of this.#waiting.splice(0)) this.#deliver(command);
    });
  }

  /** Forgets a window that closed. */
  detach(target: CommandTarget): void {
    if (this.#target === target) {
      this.#target = null;
      this.#ready = false;
    }
  }

  /** Sends `command` now, or as soon as a window has loaded. */
  send(command: HostCommand): void {
    if (this.#ready && this.#target && !this.#target.isDestroyed()) this.#deliver(command);
    else this.#waiting.push(command);
  }

  #deliver(command: HostCommand): void {
    this.#target!.send(HOST_COMMAND_CHANNEL, command);
  }
}
