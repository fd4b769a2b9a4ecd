import { mkdir, rename, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import type { AutosaveSnapshot, RecoveryOffer } from '../ui/host/hostApi.ts';
import { readJsonFile, writeJsonFile } from './jsonFile.ts';

/** Reads a stored copy, or null when it is missing or not one of ours. */
async function readCopy(path: string): Promise<RecoveryOffer | null> {
  const value = (await readJsonFile(path)) as Partial<RecoveryOffer> | undefined;
  if (typeof value !== 'object' || value === null) return null;
  const { name, text, savedAt, path: origin } = value;
  if (typeof name !== 'string' || typeof text !== 'string' || typeof savedAt !== 'string' || Number.isNaN(Date.parse(savedAt))) return null;
  return typeof origin === 'string' ? { name, path: origin, text, savedAt } : { name, text, savedAt };
}

async function exists(path: string): Promise<boolean> {
  return stat(path).then(() => true, () => false);
}

/**
 * The crash-safe working copy of a dirty document, in the folder given (the app's data
 * folder): `working-copy.json` while this session runs, `session.json` as the marker of a
 * running session. A clean exit removes both; a working copy found at the next start was
 * therefore left by a session that crashed or was killed, and it becomes the recovery
 * offer (`recovered.json`) until the user restores or declines it.
 */
export class RecoveryStore {
  readonly #folder: string;
  readonly #now: () => Date;

  constructor(folder: string, now: () => Date = () => new Date()) {
    this.#folder = folder;
    this.#now = now;
  }

  get #working() { return join(this.#folder, 'working-copy.json'); }
  get #recovered() { return join(this.#folder, 'recovered.json'); }
  get #marker() { return join(this.#folder, 'session.json'); }

  /**
   * Starts a session: moves a working copy left by the last one aside as the recovery
   * offer and marks this session as running. Resolves to whether the last session ended
   * cleanly (false after a crash or kill, also when it left nothing to recover).
   */
  async begin(): Promise<{ previousEndedCleanly: boolean }> {
    await mkdir(this.#folder, { recursive: true });
    const previousEndedCleanly = !(await exists(this.#marker));
    if (await readCopy(this.#working)) await rename(this.#working, this.#recovered);
    else await rm(this.#working, { force: true });
    await writeJsonFile(this.#marker, { pid: process.pid, startedAt: this.#now().toISOString() });
    return { previousEndedCleanly };
  }

  /** Stores `snapshot` as the working copy with the current time, atomically. */
  async write(snapshot: AutosaveSnapshot): Promise<RecoveryOffer> {
    const copy: RecoveryOffer = snapshot.path === undefined
      ? { name: snapshot.name, text: snapshot.text, savedAt: this.#now().toISOString() }
      : { name: snapshot.name, path: snapshot.path, text: snapshot.text, savedAt: this.#now().toISOString() };
    await writeJsonFile(this.#working, copy);
    return copy;
  }

  /** Removes the working copy (the document is saved or its changes were discarded). */
  async clear(): Promise<void> {
    await rm(this.#working, { force: true });
  }

  /** The copy left by a session that did not end cleanly, if any. */
  async offer(): Promise<RecoveryOffer | null> {
    return readCopy(this.#recovered);
  }

  /** Forgets the recovery offer. */
  async dismiss(): Promise<void> {
    await rm(this.#recovered, { force: true });
  }

  /** Ends the session cleanly: the working copy goes first, then the running marker. */
  async end(): Promise<void> {
    await this.clear();
    await rm(this.#marker, { force: true });
  }
}
