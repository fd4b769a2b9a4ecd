import type { AutosaveSnapshot, CloseReply, ExportRequest, HostApi, HostWire, OpenedFile, RecentFile, RecoveryOffer, SaveRequest, SavedFile } from '../../../../ui/host/hostApi.ts';

/**
 * An in-memory host for tests: files to hand out on open, and a record of what was saved,
 * autosaved and answered. It serves as the renderer's host and as the main process's host
 * behind IPC (a dropped file may be given as a File or, as on the wire, as a path).
 */
export function createFakeHost(opens: (OpenedFile | null | Error)[] = [], saves: (SavedFile | null)[] = []) {
  const saved: SaveRequest[] = [];
  const exported: ExportRequest[] = [];
  const autosaved: (AutosaveSnapshot | null)[] = [];
  const closeReplies: CloseReply[] = [];
  const known: string[] = [];
  const recent: RecentFile[] = [];
  let offer: RecoveryOffer | null = null;
  const nextOpen = async () => {
    const next = opens.shift();
    if (next instanceof Error) throw next;
    return next ?? null;
  };
  const host = {
    openDocument: nextOpen,
    async openKnownFile(path: string) {
      known.push(path);
      return nextOpen();
    },
    async openDroppedFile(file: File | string) {
      return typeof file === 'string' ? nextOpen() : { name: file.name, text: await file.text() };
    },
    async saveDocument(request: SaveRequest) {
      saved.push(request);
      return saves.length > 0 ? (saves.shift() ?? null) : { name: request.suggestedName, path: request.path ?? `/fake/${request.suggestedName}` };
    },
    async exportFile(request: ExportRequest) {
      exported.push(request);
      return { name: request.suggestedName };
    },
    async recentFiles() {
      return recent.map((entry) => ({ ...entry }));
    },
    async autosave(snapshot: AutosaveSnapshot | null) {
      autosaved.push(snapshot);
    },
    async recoveryOffer() {
      return offer;
    },
    async dismissRecovery() {
      offer = null;
    },
    async replyClose(reply: CloseReply) {
      closeReplies.push(reply);
    },
    async hostInfo() {
      return { kind: 'browser' as const, canSaveInPlace: true };
    },
  } satisfies HostApi & HostWire;
  const setOffer = (next: RecoveryOffer | null) => void (offer = next);
  return { host, saved, exported, autosaved, closeReplies, known, recent, setOffer };
}
