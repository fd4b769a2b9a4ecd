import { DOCUMENT_EXTENSION, EXPORT_TYPES, type CloseReply, type ExportRequest, type HostApi, type OpenedFile, type RecentFile, type SaveRequest, type SavedFile } from './hostApi.ts';
import { pickFile } from './pickFile.ts';
import { downloadBlob } from './downloadBlob.ts';
import { saveWithPicker, type SavePickerOptions, type SavePickerWindow } from './savePicker.ts';
import { createBrowserRecovery, type SnapshotStorage } from './browserRecovery.ts';

/** Largest file the browser host reads (bytes); bigger files are refused before reading. */
export const MAX_OPEN_BYTES = 50_000_000;

const DOCUMENT_TYPE = { description: 'Passline document', accept: { 'application/json': [DOCUMENT_EXTENSION] } };

/** `localStorage`, or null where the page may not use it (privacy settings, sandboxed frames). */
function localStorageOf(win: Window): SnapshotStorage | null {
  try {
    return win.localStorage ?? null;
  } catch {
    return null;
  }
}

/** Reads a file the user gave us, refusing one over the size limit before reading it. */
async function readPicked(file: File): Promise<OpenedFile> {
  if (file.size > MAX_OPEN_BYTES) throw new Error(`${file.name} is too large to open (${file.size} bytes; the limit is ${MAX_OPEN_BYTES})`);
  return { name: file.name, text: await file.text() };
}

/**
 * The host for a plain browser: a file input to open; the File System Access save picker
 * where the browser has one (so later saves go back to the same file), else a download.
 * The working copy lives in `localStorage`. A page cannot reopen files by name, so the
 * recent list is empty, and it never asks to close (the app uses `beforeunload`).
 */
export function createBrowserHost(win: Window & SavePickerWindow = window) {
  const handles = new Map<string, FileSystemFileHandle>();
  const usePicker = typeof win.showSaveFilePicker === 'function';
  const recovery = createBrowserRecovery(localStorageOf(win));

  async function write(blob: Blob, options: SavePickerOptions, token?: string): Promise<SavedFile | null> {
    if (!usePicker) {
      downloadBlob(win.document, blob, options.suggestedName);
      return { name: options.suggestedName };
    }
    const handle = await saveWithPicker(win, blob, options, token ? handles.get(token) : undefined);
    if (!handle) return null;
    const path = token && handles.get(token) === handle ? token : `browser-file:${handles.size + 1}`;
    handles.set(path, handle);
    return { name: handle.name, path };
  }

  return {
    async openDocument() {
      const file = await pickFile(win.document, `${DOCUMENT_EXTENSION},application/json,.json`);
      return file ? readPicked(file) : null;
    },
    async openKnownFile(_path: string): Promise<OpenedFile | null> {
      throw new Error('a web page cannot reopen a file by its name; use Open… instead');
    },
    openDroppedFile: readPicked,
    async saveDocument(request: SaveRequest) {
      const blob = new Blob([request.text], { type: 'application/json' });
      return write(blob, { suggestedName: request.suggestedName, types: [DOCUMENT_TYPE] }, request.path);
    },
    async exportFile(request: ExportRequest) {
      const blob = new Blob([request.data as BlobPart], { type: request.mimeType });
      const type = { description: request.mimeType, accept: { [request.mimeType]: [EXPORT_TYPES[request.mimeType]] } };
      return write(blob, { suggestedName: request.suggestedName, types: [type] });
    },
    async recentFiles(): Promise<RecentFile[]> {
      return [];
    },
    ...recovery,
    async replyClose(_reply: CloseReply) {},
    async hostInfo() {
      return { kind: 'browser' as const, canSaveInPlace: usePicker };
    },
  } satisfies HostApi;
}
