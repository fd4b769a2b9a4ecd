/**
 * The one interface through which the renderer reaches files and dialogs. The desktop
 * preload, the browser implementation and the test fake each `satisfies HostApi`, and the
 * IPC channel names are derived from it below, so the four cannot drift apart.
 * Everything crossing it is a plain value (strings, numbers, Uint8Array): no callbacks,
 * no handles, no Node or DOM objects.
 */

/** A document the user chose to open. */
export interface OpenedFile {
  /** File name without folders, e.g. "hydroamination.passline". */
  name: string;
  /** Opaque token for saving back to the same place (a path on the desktop); absent when the host cannot write back. */
  path?: string;
  text: string;
}

/** Where a save or export ended up. */
export interface SavedFile {
  name: string;
  /** Opaque token as in {@link OpenedFile.path}. */
  path?: string;
}

/** Save a document: to `path` when given and writable, otherwise wherever the user picks. */
export interface SaveRequest {
  suggestedName: string;
  text: string;
  path?: string;
}

/** Export a figure or table; the user always picks the destination. */
export interface ExportRequest {
  suggestedName: string;
  data: string | Uint8Array;
  mimeType: ExportMimeType;
}

/** Kinds of file the renderer may export. */
export const EXPORT_TYPES = {
  'image/svg+xml': '.svg',
  'application/pdf': '.pdf',
  'image/png': '.png',
  'text/csv': '.csv',
  'text/markdown': '.md',
  'application/json': '.json',
} as const;
export type ExportMimeType = keyof typeof EXPORT_TYPES;

/** What the renderer may know about its host. */
export interface HostInfo {
  kind: 'desktop' | 'browser';
  /** True when saving can write back to an opened or saved file without asking again. */
  canSaveInPlace: boolean;
}

/** The host interface. Every method resolves to `null` when the user cancels. */
export interface HostApi {
  openDocument(): Promise<OpenedFile | null>;
  saveDocument(request: SaveRequest): Promise<SavedFile | null>;
  exportFile(request: ExportRequest): Promise<SavedFile | null>;
  hostInfo(): Promise<HostInfo>;
}

/** IPC channel for each host method (the desktop preload and main process use these). */
export const hostChannels = {
  openDocument: 'passline:open-document',
  saveDocument: 'passline:save-document',
  exportFile: 'passline:export-file',
  hostInfo: 'passline:host-info',
} as const satisfies Record<keyof HostApi, string>;

/** Extension of Passline documents. */
export const DOCUMENT_EXTENSION = '.passline';

/** Name under which preload exposes the host on `window`. */
export const HOST_GLOBAL = 'passlineHost';
