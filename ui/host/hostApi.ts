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

/** A file the user opened before, newest first in {@link HostApi.recentFiles}. */
export interface RecentFile {
  name: string;
  /** Token for {@link HostApi.openKnownFile}. */
  path: string;
}

/** The working copy the host keeps while a document has unsaved changes. */
export interface AutosaveSnapshot {
  /** File name shown to the user, e.g. "route.passline" or "untitled.passline". */
  name: string;
  /** Where the document was opened from or last saved, when known. */
  path?: string;
  text: string;
}

/** An autosaved copy left behind by a session that ended without closing cleanly. */
export interface RecoveryOffer extends AutosaveSnapshot {
  /** When the copy was written (ISO 8601, UTC), to tell the user "from when". */
  savedAt: string;
}

/** The renderer's answer when the host asks whether the window may close. */
export interface CloseReply {
  /** True when the document has changes that are not saved. */
  dirty: boolean;
  /** Name of the document, for the question "save changes to …?". */
  name: string;
}

/**
 * The host interface. Every method resolves to `null` when the user cancels.
 * Saving to a known `path` checks first whether the file changed on disk since it was
 * opened or last saved, and asks before overwriting such a change.
 */
export interface HostApi {
  openDocument(): Promise<OpenedFile | null>;
  /** Opens a file the user already chose: from the recent list, the command line, the system or a drop. */
  openKnownFile(path: string): Promise<OpenedFile | null>;
  /** Opens a file dropped on the window (a `File` from the drop event). */
  openDroppedFile(file: File): Promise<OpenedFile | null>;
  saveDocument(request: SaveRequest): Promise<SavedFile | null>;
  exportFile(request: ExportRequest): Promise<SavedFile | null>;
  /** Recently opened or saved documents, newest first. */
  recentFiles(): Promise<RecentFile[]>;
  /** Keeps `snapshot` as the crash-safe working copy; `null` says the document is clean again. */
  autosave(snapshot: AutosaveSnapshot | null): Promise<void>;
  /** A working copy from a session that did not end cleanly, or null. */
  recoveryOffer(): Promise<RecoveryOffer | null>;
  /** Forgets the recovery offer (after it was restored or declined). */
  dismissRecovery(): Promise<void>;
  /** Answers the host's `closeRequested` command. */
  replyClose(reply: CloseReply): Promise<void>;
  hostInfo(): Promise<HostInfo>;
}

/** IPC channel for each host method (the desktop preload and main process use these). */
export const hostChannels = {
  openDocument: 'passline:open-document',
  openKnownFile: 'passline:open-known-file',
  openDroppedFile: 'passline:open-dropped-file',
  saveDocument: 'passline:save-document',
  exportFile: 'passline:export-file',
  recentFiles: 'passline:recent-files',
  autosave: 'passline:autosave',
  recoveryOffer: 'passline:recovery-offer',
  dismissRecovery: 'passline:dismiss-recovery',
  replyClose: 'passline:reply-close',
  hostInfo: 'passline:host-info',
} as const satisfies Record<keyof HostApi, string>;

/**
 * What each method sends over IPC. It is the host interface itself except for a dropped
 * file, which preload turns into the file's path (a `File` cannot cross to the main process).
 */
export type HostWire = Omit<HostApi, 'openDroppedFile'> & { openDroppedFile(path: string): Promise<OpenedFile | null> };

/** Channel on which the main process sends {@link HostCommand}s to the renderer. */
export const HOST_COMMAND_CHANNEL = 'passline:command';

/** Name under which preload exposes the command subscription on `window`. */
export const COMMANDS_GLOBAL = 'passlineCommands';

/** What preload exposes under {@link COMMANDS_GLOBAL}. */
export interface CommandSource {
  /** Calls `listener` with each command from the host; returns the function that stops it. */
  subscribe(listener: (command: unknown) => void): () => void;
}

/** Extension of Passline documents. */
export const DOCUMENT_EXTENSION = '.passline';

/** Name under which preload exposes the host on `window`. */
export const HOST_GLOBAL = 'passlineHost';
