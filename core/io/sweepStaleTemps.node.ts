import { lstat, readdir, unlink } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { isTempNameOf } from './tempName.node.ts';

/**
 * Age beyond which a temporary file counts as left by an interrupted write: 10 minutes, our
 * choice — far longer than any write of a document or figure takes, so a write in progress
 * in another instance of the app is never touched.
 */
export const STALE_TEMP_AGE_MS = 10 * 60 * 1000;

const gone = (error: unknown) => ['ENOENT', 'ENOTDIR'].includes((error as NodeJS.ErrnoException).code ?? '');

/**
 * Removes the temporary files that interrupted `atomicWrite`s of `target` left in its folder:
 * only regular files named exactly `.<basename>.<12 lowercase hex>.tmp` whose modification
 * time is older than `olderThanMs`. Symbolic links are never followed nor removed (a temp
 * file of ours is never one). A missing folder, or a file that vanished or cannot be removed
 * meanwhile, is skipped; only a folder that cannot be listed for another reason throws.
 * Resolves to the paths removed.
 */
export async function sweepStaleTemps(target: string, options: { olderThanMs?: number } = {}): Promise<string[]> {
  const olderThanMs = options.olderThanMs ?? STALE_TEMP_AGE_MS;
  const folder = dirname(target);
  let names: string[];
  try {
    names = await readdir(folder);
  } catch (error) {
    if (gone(error)) return [];
    throw error;
  }
  const removed: string[] = [];
  for (const name of names.filter((n) => isTempNameOf(n, target))) {
    const path = join(folder, name);
    try {
      const info = await lstat(path);
      if (!info.isFile() || Date.now() - info.mtimeMs <= olderThanMs) continue;
      await unlink(path);
      removed.push(path);
    } catch {
      // Vanished (another instance finished or swept it) or not ours to remove: leave it.
    }
  }
  return removed;
}
