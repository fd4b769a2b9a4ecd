import type { FileFilter } from 'electron';
import { stat } from 'node:fs/promises';
import { basename, resolve } from 'node:path';
import { DOCUMENT_EXTENSION, EXPORT_TYPES, type AutosaveSnapshot, type CloseReply, type HostWire, type OpenedFile, type SaveRequest } from '../ui/host/hostApi.ts';
import { atomicWrite } from '../core/io/atomicWrite.node.ts';
import { sweepStaleTemps } from '../core/io/sweepStaleTemps.node.ts';
import { FileLockedError } from '../core/io/withFileLock.node.ts';
import { diskState, fingerprintOf, type FileFingerprint } from './fileFingerprint.ts';
import { documentFilter, exportFilter, withExtension } from './fileFilters.ts';
import type { Logger } from './hardenContents.ts';
import type { PathGrants } from './pathGrants.ts';
import type { DropRegistry } from './dropRegistry.ts';
import { fileError, readDocumentFile } from './readDocumentFile.ts';
import type { RecentStore } from './recentStore.ts';
import type { RecoveryStore } from './recoveryStore.ts';
import { saveWithBackup } from './saveWithBackup.ts';

export { MAX_DOCUMENT_BYTES } from './readDocumentFile.ts';

/** The user's answer when the file to save over changed on disk since it was read. */
export type OverwriteChoice = 'overwrite' | 'saveAs' | 'cancel';

/** The native dialogs the desktop host asks (injected so that tests need no Electron). */
export interface DesktopDialogs {
  pickOpenPath(): Promise<string | null>;
  pickSavePath(suggestedName: string, filter: FileFilter): Promise<string | null>;
  /** Asks whether to replace `name`, which another program changed at `changedAt`. */
  confirmOverwrite(name: string, changedAt: Date): Promise<OverwriteChoice>;
}

/** What the desktop host works with besides the dialogs. */
export interface DesktopHostDeps {
  dialogs: DesktopDialogs;
  grants: PathGrants;
  /** Paths of files really dropped on an app window (announced by preload). */
  drops: DropRegistry;
  recent: RecentStore;
  recovery: RecoveryStore;
  /** Receives the renderer's answer to `closeRequested`. */
  onCloseReply(reply: CloseReply): Promise<void>;
  /** Told when the recent list changed (to rebuild the menu). */
  onRecentChanged(): void;
  log: Logger;
}

/**
 * The main-process implementation of the host interface: native dialogs, reads through
 * node:fs, atomic writes (documents keep their previous version as a backup), a check for
 * outside changes before saving over a file, and the recovery working copy. It receives
 * arguments only after IPC validation.
 */
export function createDesktopHost(deps: DesktopHostDeps) {
  const { dialogs, grants, drops, recent, recovery, log } = deps;
  // What this session last read from or wrote to each document, to notice outside changes.
  const known = new Map<string, FileFingerprint>();

  async function remember(path: string, fingerprint: FileFingerprint): Promise<void> {
    grants.grant(path);
    known.set(resolve(path), fingerprint);
    await recent.add(path).then(deps.onRecentChanged, (error: unknown) => log(`could not store the recent list: ${String(error)}`));
  }

  async function open(path: string): Promise<OpenedFile> {
    try {
      const read = await readDocumentFile(path);
      await remember(path, read.fingerprint);
      return read.file;
    } catch (error) {
      if (recent.has(path)) await recent.remove(path).then(deps.onRecentChanged, () => undefined);
      throw error;
    }
  }

  /** The path to save to: the known one unless the user chose otherwise after an outside change. */
  async function destination(request: SaveRequest): Promise<string | null> {
    const current = request.path && grants.allows(request.path) ? request.path : null;
    if (current) {
      const before = known.get(resolve(current));
      const state = before ? await diskState(current, before).catch(() => ({ kind: 'unchanged' as const })) : { kind: 'unchanged' as const };
      const choice = state.kind === 'changed' ? await dialogs.confirmOverwrite(basename(current), state.mtime) : 'overwrite';
      if (choice === 'cancel') return null;
      if (choice === 'overwrite') return current;
    }
    const picked = await dialogs.pickSavePath(request.suggestedName, documentFilter);
    return picked ? withExtension(picked, DOCUMENT_EXTENSION) : null;
  }

  return {
    async openDocument() {
      const path = await dialogs.pickOpenPath();
      return path ? open(path) : null;
    },
    async openKnownFile(path: string) {
      if (!grants.allows(path) && !recent.has(path)) throw new Error(`${basename(path)} was not chosen in this app; use Open… to pick it`);
      return open(path);
    },
    // Only a path announced by preload's listener for a trusted drop event, once, shortly after.
    async openDroppedFile(path: string) {
      if (!drops.take(path)) throw new Error(`${basename(path)} was not dropped on the window; use Open… to pick it`);
      return open(path);
    },
    async saveDocument(request: SaveRequest) {
      const path = await destination(request);
      if (!path) return null;
      try {
        await saveWithBackup(path, request.text);
        await remember(path, fingerprintOf(request.text, (await stat(path)).mtimeMs));
      } catch (error) {
        throw error instanceof FileLockedError ? error : fileError('write', path, error);
      }
      return { name: basename(path), path };
    },
    async exportFile(request) {
      const picked = await dialogs.pickSavePath(request.suggestedName, exportFilter(request.mimeType));
      if (!picked) return null;
      const path = withExtension(picked, EXPORT_TYPES[request.mimeType]);
      await atomicWrite(path, request.data).catch((error: unknown) => { throw fileError('write', path, error); });
      await sweepStaleTemps(path).catch(() => []);
      return { name: basename(path), path };
    },
    async recentFiles() {
      return recent.list();
    },
    async autosave(snapshot: AutosaveSnapshot | null) {
      if (snapshot) await recovery.write(snapshot);
      else await recovery.clear();
    },
    async recoveryOffer() {
      const offer = await recovery.offer();
      // The path in a working copy was written by the renderer, so it proves nothing: the
      // text comes back as an untitled document and its first save asks where (no grant).
      return offer && { name: offer.name, text: offer.text, savedAt: offer.savedAt };
    },
    async dismissRecovery() {
      await recovery.dismiss();
    },
    async replyClose(reply: CloseReply) {
      await deps.onCloseReply(reply);
    },
    async hostInfo() {
      return { kind: 'desktop' as const, canSaveInPlace: true };
    },
  } satisfies HostWire;
}
