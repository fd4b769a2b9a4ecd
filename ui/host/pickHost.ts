import { HOST_GLOBAL, type HostApi } from './hostApi.ts';
import { createBrowserHost } from './browserHost.ts';

/** The desktop host that preload exposed on `window`, or the browser host when there is none. */
export function pickHost(win: Window = window): HostApi {
  const exposed = (win as unknown as Record<string, unknown>)[HOST_GLOBAL];
  return exposed ? (exposed as HostApi) : createBrowserHost(win);
}
