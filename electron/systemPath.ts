import { isAbsolute, resolve } from 'node:path';
import { DOCUMENT_EXTENSION } from '../ui/host/hostApi.ts';
import { IPC_PATH_CHARS } from '../ui/host/limits.ts';

/**
 * A document path handed over by the system (command line, file association, a second
 * launch) in normal form, or null when it is not an absolute path to a `.passline` file
 * of sane length. Only such a path is granted for opening; the file itself is checked
 * again when it is read.
 */
export function acceptSystemPath(path: unknown): string | null {
  if (typeof path !== 'string' || path.length === 0 || path.length > IPC_PATH_CHARS || path.includes('\u0000')) return null;
  if (!isAbsolute(path) || !path.toLowerCase().endsWith(DOCUMENT_EXTENSION)) return null;
  return resolve(path);
}
