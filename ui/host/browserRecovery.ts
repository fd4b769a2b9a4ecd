import type { AutosaveSnapshot, RecoveryOffer } from './hostApi.ts';

const WORKING_KEY = 'passline:autosave';
const RECOVERED_KEY = 'passline:recovered';

/** The parts of `Storage` used here (`localStorage` in a browser). */
export type SnapshotStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

function readOffer(text: string | null): RecoveryOffer | null {
  if (!text) return null;
  try {
    const value = JSON.parse(text) as Partial<RecoveryOffer>;
    const ok = typeof value.name === 'string' && typeof value.text === 'string' && typeof value.savedAt === 'string';
    return ok ? { name: value.name!, text: value.text!, savedAt: value.savedAt! } : null;
  } catch {
    return null;
  }
}

/**
 * The browser's working copy in `localStorage`. A copy still there when a page starts was
 * left by a tab that closed or crashed with unsaved changes; it is moved aside as the
 * recovery offer so that this page's own autosaves do not overwrite it.
 */
export function createBrowserRecovery(storage: SnapshotStorage | null, now: () => Date = () => new Date()) {
  const left = storage?.getItem(WORKING_KEY) ?? null;
  if (storage && left) {
    storage.setItem(RECOVERED_KEY, left);
    storage.removeItem(WORKING_KEY);
  }
  return {
    async autosave(snapshot: AutosaveSnapshot | null): Promise<void> {
      if (!storage) return;
      if (!snapshot) return storage.removeItem(WORKING_KEY);
      // A full storage quota throws here; the caller reports it like any failed autosave.
      storage.setItem(WORKING_KEY, JSON.stringify({ name: snapshot.name, text: snapshot.text, savedAt: now().toISOString() }));
    },
    async recoveryOffer(): Promise<RecoveryOffer | null> {
      return readOffer(storage?.getItem(RECOVERED_KEY) ?? null);
    },
    async dismissRecovery(): Promise<void> {
      storage?.removeItem(RECOVERED_KEY);
    },
  };
}
