import { open, rename, unlink } from 'node:fs/promises';
import { dirname } from 'node:path';
import { randomBytes } from 'node:crypto';
import { tempPathFor } from './tempName.node.ts';

/** Flushes a folder's entry table so a rename survives power loss (POSIX; Windows cannot open folders). */
async function syncFolder(folder: string): Promise<void> {
  if (process.platform === 'win32') return;
  const handle = await open(folder, 'r');
  try {
    await handle.sync();
  } finally {
    await handle.close();
  }
}

/**
 * Replaces `target` with `data` so that a crash at any moment leaves either the old file
 * or the new one, never a torn mix: write a temporary file in the same folder (a rename
 * is atomic only within one file system), flush it to disk, then rename it over the target.
 * A process killed mid-write leaves the temporary file; `sweepStaleTemps` removes it later.
 */
export async function atomicWrite(target: string, data: string | Uint8Array): Promise<void> {
  const folder = dirname(target);
  const temp = tempPathFor(target, randomBytes(6).toString('hex'));
  const handle = await open(temp, 'wx');
  try {
    try {
      await handle.writeFile(data);
      await handle.sync();
    } finally {
      await handle.close();
    }
    await rename(temp, target);
  } catch (error) {
    await unlink(temp).catch(() => undefined);
    throw error;
  }
  await syncFolder(folder);
}
