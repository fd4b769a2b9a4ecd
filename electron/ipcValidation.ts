import { isAbsolute } from 'node:path';
import { DOCUMENT_EXTENSION, EXPORT_TYPES, type AutosaveSnapshot, type CloseReply, type ExportRequest, type HostWire, type SaveRequest } from '../ui/host/hostApi.ts';
import { IPC_PATH_CHARS } from '../ui/host/limits.ts';

/** A checked IPC message: the typed arguments, or why they were refused. */
export type Checked<T> = { ok: true; value: T } | { ok: false; reason: string };

/** Size limits for what crosses IPC. */
export const IPC_LIMITS = {
  nameChars: 255,
  pathChars: IPC_PATH_CHARS,
  textChars: 50_000_000,
  binaryBytes: 200_000_000,
} as const;

const refuse = (reason: string): { ok: false; reason: string } => ({ ok: false, reason });

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && Object.getPrototypeOf(value) === Object.prototype;
}

/** Keys outside `allowed`, if any (extra fields are refused, not ignored). */
function extraKeys(value: Record<string, unknown>, allowed: readonly string[]): string[] {
  return Object.keys(value).filter((key) => !allowed.includes(key));
}

// Folders, NUL and other control characters have no place in a name the user is offered.
const BAD_NAME = /[\\/\u0000-\u001f\u007f]/;

/** Checks a bare file name (in field `field`) that must end with `extension`. */
export function checkFileName(value: unknown, extension: string, field = 'suggestedName'): string | null {
  if (typeof value !== 'string') return `${field}: expected a string`;
  if (value.length === 0 || value.length > IPC_LIMITS.nameChars) return `${field}: expected 1 to ${IPC_LIMITS.nameChars} characters`;
  if (BAD_NAME.test(value) || value === '.' || value === '..') return `${field}: expected a file name without folders or control characters`;
  if (!value.toLowerCase().endsWith(extension)) return `${field}: expected a name ending in ${extension}`;
  return null;
}

/** Checks an absolute path to a Passline document. */
export function checkPath(value: unknown): string | null {
  if (typeof value !== 'string') return 'path: expected a string';
  if (value.length > IPC_LIMITS.pathChars || value.includes('\u0000') || !isAbsolute(value)) return 'path: expected an absolute path';
  if (!value.toLowerCase().endsWith(DOCUMENT_EXTENSION)) return `path: expected a ${DOCUMENT_EXTENSION} file`;
  return null;
}

/** Arguments of `saveDocument`. */
export function checkSaveArgs(args: readonly unknown[]): Checked<[SaveRequest]> {
  const [request] = args;
  if (args.length !== 1 || !isPlainObject(request)) return refuse('expected one request object');
  const extra = extraKeys(request, ['suggestedName', 'text', 'path']);
  if (extra.length > 0) return refuse(`unexpected field ${extra[0]}`);
  const problem = checkFileName(request.suggestedName, DOCUMENT_EXTENSION)
    ?? (typeof request.text !== 'string' ? 'text: expected a string' : null)
    ?? ((request.text as string).length > IPC_LIMITS.textChars ? `text: longer than ${IPC_LIMITS.textChars} characters` : null)
    ?? (request.path === undefined ? null : checkPath(request.path));
  if (problem) return refuse(problem);
  return { ok: true, value: [request as unknown as SaveRequest] };
}

/** Arguments of `exportFile`. */
export function checkExportArgs(args: readonly unknown[]): Checked<[ExportRequest]> {
  const [request] = args;
  if (args.length !== 1 || !isPlainObject(request)) return refuse('expected one request object');
  const extra = extraKeys(request, ['suggestedName', 'data', 'mimeType']);
  if (extra.length > 0) return refuse(`unexpected field ${extra[0]}`);
  const { mimeType, data } = request;
  if (typeof mimeType !== 'string' || !Object.hasOwn(EXPORT_TYPES, mimeType)) return refuse('mimeType: expected one of the export types');
  const problem = checkFileName(request.suggestedName, EXPORT_TYPES[mimeType as keyof typeof EXPORT_TYPES])
    ?? (typeof data === 'string' ? (data.length > IPC_LIMITS.textChars ? 'data: text too long' : null)
      : data instanceof Uint8Array ? (data.byteLength > IPC_LIMITS.binaryBytes ? 'data: too many bytes' : null)
        : 'data: expected a string or bytes');
  if (problem) return refuse(problem);
  return { ok: true, value: [request as unknown as ExportRequest] };
}

/** Arguments of `openKnownFile` and (after preload turned the file into its path) `openDroppedFile`. */
export function checkPathArgs(args: readonly unknown[]): Checked<[string]> {
  if (args.length !== 1) return refuse('expected one path');
  const problem = checkPath(args[0]);
  return problem ? refuse(problem) : { ok: true, value: [args[0] as string] };
}

/** Arguments of `autosave`: a snapshot, or null when the document is clean again. */
export function checkAutosaveArgs(args: readonly unknown[]): Checked<[AutosaveSnapshot | null]> {
  const [snapshot] = args;
  if (args.length !== 1) return refuse('expected one snapshot or null');
  if (snapshot === null) return { ok: true, value: [null] };
  if (!isPlainObject(snapshot)) return refuse('expected one snapshot or null');
  const extra = extraKeys(snapshot, ['name', 'text', 'path']);
  if (extra.length > 0) return refuse(`unexpected field ${extra[0]}`);
  const problem = checkFileName(snapshot.name, DOCUMENT_EXTENSION, 'name')
    ?? (typeof snapshot.text !== 'string' ? 'text: expected a string' : null)
    ?? ((snapshot.text as string).length > IPC_LIMITS.textChars ? `text: longer than ${IPC_LIMITS.textChars} characters` : null)
    ?? (snapshot.path === undefined ? null : checkPath(snapshot.path));
  return problem ? refuse(problem) : { ok: true, value: [snapshot as unknown as AutosaveSnapshot] };
}

/** Arguments of `replyClose`. */
export function checkCloseReplyArgs(args: readonly unknown[]): Checked<[CloseReply]> {
  const [reply] = args;
  if (args.length !== 1 || !isPlainObject(reply)) return refuse('expected one reply object');
  const extra = extraKeys(reply, ['dirty', 'name']);
  if (extra.length > 0) return refuse(`unexpected field ${extra[0]}`);
  if (typeof reply.dirty !== 'boolean') return refuse('dirty: expected true or false');
  const { name } = reply;
  if (typeof name !== 'string' || name.length > IPC_LIMITS.nameChars || /[\u0000-\u001f\u007f]/.test(name)) return refuse(`name: expected up to ${IPC_LIMITS.nameChars} characters without control characters`);
  return { ok: true, value: [{ dirty: reply.dirty, name }] };
}

/** Methods that take no arguments get none. */
export function checkNoArgs(args: readonly unknown[]): Checked<[]> {
  return args.length === 0 ? { ok: true, value: [] } : refuse('expected no arguments');
}

/** The checker for each host method's arguments. */
export const argumentCheckers: { [K in keyof HostWire]: (args: readonly unknown[]) => Checked<Parameters<HostWire[K]>> } = {
  openDocument: checkNoArgs,
  openKnownFile: checkPathArgs,
  openDroppedFile: checkPathArgs,
  saveDocument: checkSaveArgs,
  exportFile: checkExportArgs,
  recentFiles: checkNoArgs,
  autosave: checkAutosaveArgs,
  recoveryOffer: checkNoArgs,
  dismissRecovery: checkNoArgs,
  replyClose: checkCloseReplyArgs,
  hostInfo: checkNoArgs,
};
