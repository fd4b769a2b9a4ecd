import type { AutosaveSnapshot } from './hostApi.ts';

/** Time from the first unsaved change to its autosave, and between autosaves while editing (ms). */
export const AUTOSAVE_INTERVAL_MS = 5_000;

/** Timers, injected so that tests can drive time. */
export interface Timers {
  set(callback: () => void, ms: number): unknown;
  clear(handle: unknown): void;
}

const realTimers: Timers = { set: (callback, ms) => setTimeout(callback, ms), clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>) };

/** What the scheduler writes through (normally `host.autosave`). */
export type AutosaveWriter = (snapshot: AutosaveSnapshot | null) => Promise<void>;

/**
 * Decides when the working copy of a dirty document is written: `interval` ms after the
 * first change, then at most once per interval while changes keep coming, always with the
 * latest snapshot; never two writes at once. `clean()` (after a save, a discard or opening
 * another document) cancels what is pending and clears the stored copy.
 */
export function createAutosaveScheduler(write: AutosaveWriter, onError: (error: unknown) => void, interval = AUTOSAVE_INTERVAL_MS, timers: Timers = realTimers) {
  let latest: (() => AutosaveSnapshot) | null = null;
  let timer: unknown = null;
  let chain: Promise<void> = Promise.resolve();

  const enqueue = (snapshot: AutosaveSnapshot | null) => {
    chain = chain.then(() => write(snapshot)).catch(onError);
    return chain;
  };

  const fire = () => {
    timer = null;
    const take = latest;
    latest = null;
    if (take) void enqueue(take());
  };

  return {
    /** The document changed; `snapshot` is called only when the copy is due. */
    changed(snapshot: () => AutosaveSnapshot): void {
      latest = snapshot;
      if (timer === null) timer = timers.set(fire, interval);
    },
    /** The document is clean again: drop any pending copy and clear the stored one. */
    clean(): Promise<void> {
      if (timer !== null) timers.clear(timer);
      timer = null;
      latest = null;
      return enqueue(null);
    },
    /** Writes a pending copy now (before the window goes away, say). */
    flush(): Promise<void> {
      if (timer !== null) timers.clear(timer);
      fire();
      return chain;
    },
    /** Stops the timer without writing. */
    dispose(): void {
      if (timer !== null) timers.clear(timer);
      timer = null;
      latest = null;
    },
  };
}
