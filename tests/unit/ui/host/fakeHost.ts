import type { ExportRequest, HostApi, OpenedFile, SaveRequest, SavedFile } from '../../../../ui/host/hostApi.ts';

/** An in-memory host for tests: files to hand out on open, and a record of what was saved. */
export function createFakeHost(opens: (OpenedFile | null | Error)[] = [], saves: (SavedFile | null)[] = []) {
  const saved: SaveRequest[] = [];
  const exported: ExportRequest[] = [];
  const host = {
    async openDocument() {
      const next = opens.shift();
      if (next instanceof Error) throw next;
      return next ?? null;
    },
    async saveDocument(request: SaveRequest) {
      saved.push(request);
      return saves.length > 0 ? (saves.shift() ?? null) : { name: request.suggestedName, path: request.path ?? `/fake/${request.suggestedName}` };
    },
    async exportFile(request: ExportRequest) {
      exported.push(request);
      return { name: request.suggestedName };
    },
    async hostInfo() {
      return { kind: 'browser' as const, canSaveInPlace: true };
    },
  } satisfies HostApi;
  return { host, saved, exported };
}
