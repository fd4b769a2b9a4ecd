/** What an IPC event tells about who sent it (a subset of Electron's IpcMainInvokeEvent). */
export interface SenderEvent {
  sender: { id: number };
  senderFrame: { url: string; parent: unknown } | null;
}

/** The URL without query or fragment, so `index.html#x` still counts as the app page. */
function pageOf(url: string): string {
  return url.replace(/[?#].*$/, '');
}

/**
 * True when a message comes from the top frame of one of the app's own windows showing
 * the app's own page; anything else (a frame, a foreign page, a closed window) is refused.
 */
export function isAppSender(event: SenderEvent, appContentsIds: ReadonlySet<number>, appUrl: string): boolean {
  const frame = event.senderFrame;
  if (!frame || frame.parent !== null) return false;
  if (!appContentsIds.has(event.sender.id)) return false;
  return pageOf(frame.url) === pageOf(appUrl);
}
