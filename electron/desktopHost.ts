import type { FileFilter } from 'electron';
import { readFile, stat } from 'node:fs/promises';
import { basename } from 'node:path';
import { DOCUMENT_EXTENSION, EXPORT_TYPES, type HostApi } from '../ui/host/hostApi.ts';
import { atomicWrite } from './atomicWrite.ts';
import { documentFilter, exportFilter, withExtension } from './fileFilters.ts';
import type { PathGrants } from './pathGrants.ts';

/** Largest document file read (bytes). */
export const MAX_DOCUMENT_BYTES = 50_000_000;

/** The native dialogs the desktop host asks (injected so that tests need no Electron). */
export interface DesktopDialogs {
  pickOpenPath(): Promise<string | null>;
  pickSavePath(suggestedName: string, filter: FileFilter): Promise<string | null>;
}

/** Message for a failed file operation, naming the file and the system's reason. */
function fileError(verb: string, path: string, error: unknown): Error {
  const code = (error as NodeJS.ErrnoException).code;
  return new Error(`could not ${verb} ${basename(path)}${code ? ` (${code})` : ''}`);
}

/**
 * The main-process implementation of the host interface: native dialogs, reads through
 * node:fs and atomic writes. It receives arguments only after IPC validation.
 */
export function createDesktopHost(dialogs: DesktopDialogs, grants: PathGrants) {
  async function write(path: string, data: string | Uint8Array): Promise<void> {
    try {
      await atomicWrite(path, data);
    } catch (error) {
      throw fileError('write', path, error);
    }
  }

  return {
    async openDocument() {
      const path = await dialogs.pickOpenPath();
      if (!path) return null;
      let text: string;
      try {
        const info = await stat(path);
        if (info.size > MAX_DOCUMENT_BYTES) throw new Error(`${basename(path)} is too large to open (${info.size} bytes; the limit is ${MAX_DOCUMENT_BYTES})`);
        text = await readFile(path, 'utf8');
      } catch (error) {
        throw error instanceof Error && !('code' in error) ? error : fileError('read', path, error);
      }
      grants.grant(path);
      return { name: basename(path), path, text };
    },
    async saveDocument(request) {
      const picked = request.path && grants.allows(request.path) ? request.path : await dialogs.pickSavePath(request.suggestedName, documentFilter);
      if (!picked) return null;
      const path = withExtension(picked, DOCUMENT_EXTENSION);
      await write(path, request.text);
      grants.grant(path);
      return { name: basename(path), path };
    },
    async exportFile(request) {
      const picked = await dialogs.pickSavePath(request.suggestedName, exportFilter(request.mimeType));
      if (!picked) return null;
      const path = withExtension(picked, EXPORT_TYPES[request.mimeType]);
      await write(path, request.data);
      return { name: basename(path), path };
    },
    async hostInfo() {
      return { kind: 'desktop' as const, canSaveInPlace: true };
    },
  } satisfies HostApi;
}
