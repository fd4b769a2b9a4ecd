import { createHash } from 'node:crypto';
import { readFile, stat } from 'node:fs/promises';

/** What the app remembers of a file it read or wrote, to notice later changes by others. */
export interface FileFingerprint {
  size: number;
  mtimeMs: number;
  /** SHA-256 of the contents, hex. */
  sha256: string;
}

/** Fingerprint of `data` as just written to or read from a file with modification time `mtimeMs`. */
export function fingerprintOf(data: string | Uint8Array, mtimeMs: number): FileFingerprint {
  const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
  return { size: bytes.byteLength, mtimeMs, sha256: createHash('sha256').update(bytes).digest('hex') };
}

/** The file's fingerprint now, or null when it does not exist. */
export async function readFingerprint(path: string): Promise<FileFingerprint | null> {
  try {
    const info = await stat(path);
    return fingerprintOf(await readFile(path), info.mtimeMs);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw error;
  }
}

/** How a file on disk compares with what the app last read or wrote there. */
export type DiskState = { kind: 'unchanged' } | { kind: 'missing' } | { kind: 'changed'; mtime: Date };

/**
 * Compares the file now with `known`. Size and modification time settle most cases at a
 * glance; the contents decide, so a file merely touched (same bytes, new time) or rewritten
 * within the file system's time resolution is judged by what it holds.
 */
export async function diskState(path: string, known: FileFingerprint): Promise<DiskState> {
  const now = await readFingerprint(path);
  if (!now) return { kind: 'missing' };
  if (now.size === known.size && now.sha256 === known.sha256) return { kind: 'unchanged' };
  return { kind: 'changed', mtime: new Date(now.mtimeMs) };
}
