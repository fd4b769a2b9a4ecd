import { basename } from 'node:path';
import lockfile from 'proper-lockfile';

/** Another process holds the lock on the file (its `NAME.lock` folder is fresh). */
export class FileLockedError extends Error {
  readonly code = 'ELOCKED';
}

/**
 * A lock not refreshed for this long belongs to a process that died (proper-lockfile's
 * minimum); waiting a little longer than this lets a save take over such a lock.
 */
const STALE_MS = 2_000;
/** Waits up to about 5 s in all (a save takes milliseconds; a dead holder's lock goes stale in 2 s). */
const RETRIES = { retries: 14, factor: 1.5, minTimeout: 25, maxTimeout: 500 };

/**
 * Runs `work` while holding an advisory lock on `target` (proper-lockfile: an atomic
 * `mkdir` of `target.lock`, refreshed while held and taken over when older than 2 s, so a
 * killed process does not block the file for ever). Waits briefly for another holder, then
 * fails with {@link FileLockedError} naming the file. The target need not exist yet.
 */
export async function withFileLock<T>(target: string, work: () => Promise<T>): Promise<T> {
  let release: () => Promise<void>;
  try {
    release = await lockfile.lock(target, { realpath: false, stale: STALE_MS, update: STALE_MS / 2, retries: RETRIES, onCompromised: () => {} });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ELOCKED') throw error;
    const name = basename(target);
    throw new FileLockedError(`${name} is being saved by another program (it holds ${name}.lock); nothing was written, try again in a moment`);
  }
  try {
    return await work();
  } finally {
    await release().catch(() => undefined);
  }
}
