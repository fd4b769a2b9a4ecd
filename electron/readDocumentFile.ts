import { readFile, stat } from 'node:fs/promises';
import { basename, isAbsolute } from 'node:path';
import { DOCUMENT_EXTENSION, type OpenedFile } from '../ui/host/hostApi.ts';
import { fingerprintOf, type FileFingerprint } from './fileFingerprint.ts';

/** Largest document file read (bytes). */
export const MAX_DOCUMENT_BYTES = 50_000_000;

/** A document read from disk, with what is needed to notice later outside changes. */
export interface ReadDocument {
  file: OpenedFile & { path: string };
  fingerprint: FileFingerprint;
}

/** An error for the user: names the file and, for a system failure, its code. */
export function fileError(verb: string, path: string, error: unknown): Error {
  const code = (error as NodeJS.ErrnoException).code;
  return new Error(`could not ${verb} ${basename(path)}${code ? ` (${code})` : ''}`);
}

/**
 * Reads a Passline document from `path`, refusing anything that is not an absolute path to
 * a regular `.passline` file within the size limit (a path from the command line, the
 * system or a drop reaches here as well as one from the open dialog).
 */
export async function readDocumentFile(path: string): Promise<ReadDocument> {
  const name = basename(path);
  if (!isAbsolute(path) || path.includes('\u0000')) throw new Error(`could not read ${name}: not an absolute path`);
  if (!path.toLowerCase().endsWith(DOCUMENT_EXTENSION)) throw new Error(`could not read ${name}: only ${DOCUMENT_EXTENSION} documents can be opened`);
  let bytes: Buffer;
  let mtimeMs: number;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new Error(`could not read ${name}: it is not a file`);
    if (info.size > MAX_DOCUMENT_BYTES) throw new Error(`${name} is too large to open (${info.size} bytes; the limit is ${MAX_DOCUMENT_BYTES})`);
    bytes = await readFile(path);
    mtimeMs = info.mtimeMs;
  } catch (error) {
    throw error instanceof Error && !('code' in error) ? error : fileError('read', path, error);
  }
  return { file: { name, path, text: bytes.toString('utf8') }, fingerprint: fingerprintOf(bytes, mtimeMs) };
}
