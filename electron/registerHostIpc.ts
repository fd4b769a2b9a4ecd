import type { IpcMainInvokeEvent } from 'electron';
import { hostChannels, type HostWire } from '../ui/host/hostApi.ts';
import { argumentCheckers } from './ipcValidation.ts';
import type { Logger } from './hardenContents.ts';

/** The part of `ipcMain` used here. */
export interface IpcHandleTarget {
  handle(channel: string, listener: (event: IpcMainInvokeEvent, ...args: unknown[]) => Promise<unknown>): void;
}

/**
 * Serves every host method on its channel. Each message is checked for its sender and
 * its arguments first; a refused one is logged and answered with a plain error that
 * tells the renderer nothing it could use.
 */
export function registerHostIpc(ipc: IpcHandleTarget, host: HostWire, isTrusted: (event: IpcMainInvokeEvent) => boolean, log: Logger): void {
  for (const method of Object.keys(hostChannels) as (keyof HostWire)[]) {
    const channel = hostChannels[method];
    ipc.handle(channel, async (event, ...args) => {
      if (!isTrusted(event)) {
        log(`refused ${channel}: sender is not an app window`);
        throw new Error('request refused');
      }
      const checked = argumentCheckers[method](args);
      if (!checked.ok) {
        log(`refused ${channel}: ${checked.reason}`);
        throw new Error(`request refused: ${checked.reason}`);
      }
      return (host[method] as (...a: unknown[]) => Promise<unknown>)(...checked.value);
    });
  }
}
