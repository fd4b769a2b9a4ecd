import { readFile } from 'node:fs/promises';
import { atomicWrite } from '../core/io/atomicWrite.node.ts';
import { sweepStaleTemps } from '../core/io/sweepStaleTemps.node.ts';
import { withFileLock } from '../core/io/withFileLock.node.ts';

/**
 * Where the previous version of a document is kept: next to it, with `.bak` added
 * ("route.passline" keeps "route.passline.bak"). One backup per document; each save
 * replaces it with the version that save overwrote.
 */
export function backupPathOf(target: string): string {
  return `${target}.bak`;
}

/** Copies `source` to `destination` atomically (whole old version or nothing); false when there is no source yet. */
async function atomicCopy(source: string, destination: string): Promise<boolean> {
  let previous: Uint8Array;
  try {
    previous = await readFile(source);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return false;
    throw error;
  }
  await atomicWrite(destination, previous);
  return true;
}

/**
 * Saves a document atomically and keeps what it replaces as the backup. The old file is
 * copied to the backup first (itself atomically) and only then replaced, so at every
 * moment the document is the old or the new version and the backup, when present, is one
 * whole earlier version. Then temporary files that interrupted earlier saves of either left
 * behind are swept, best effort. Resolves to whether a previous version was kept.
 * Two processes saving one file take turns (an advisory lock on the target, see
 * withFileLock); when the other one holds it too long this fails with FileLockedError.
 */
export async function saveWithBackup(target: string, data: string | Uint8Array): Promise<boolean> {
  const kept = await withFileLock(target, async () => {
    const had = await atomicCopy(target, backupPathOf(target));
    await atomicWrite(target, data);
    return had;
  });
  await Promise.all([target, backupPathOf(target)].map((path) => sweepStaleTemps(path).catch(() => [])));
  return kept;
}
