import { resolve } from 'node:path';

/** Channel on which preload announces the paths of files in a real (trusted) drop event. */
export const DROP_CHANNEL = 'passline:dropped-paths';

/** How long a dropped path may be opened after the drop (ms). */
const DROP_TTL_MS = 10_000;
/** Most paths one drop announces. */
const MAX_DROPPED = 32;

/**
 * Paths of files the user really dropped on an app window, each openable once and only
 * shortly after the drop. `openDroppedFile` reads and grants nothing that is not here, so
 * a path named by page script is refused.
 */
export class DropRegistry {
  readonly #paths = new Map<string, number>();
  readonly #now: () => number;

  constructor(now: () => number = Date.now) {
    this.#now = now;
  }

  /** Records the paths of one drop (called for preload's announcement). Non-strings are ignored. */
  record(paths: unknown): void {
    if (!Array.isArray(paths)) return;
    for (const path of paths.slice(0, MAX_DROPPED)) {
      if (typeof path === 'string' && path !== '' && !path.includes('\u0000')) this.#paths.set(resolve(path), this.#now());
    }
  }

  /** True (once) when `path` was dropped in the last few seconds. */
  take(path: string): boolean {
    const key = resolve(path);
    const at = this.#paths.get(key);
    this.#paths.delete(key);
    return at !== undefined && this.#now() - at <= DROP_TTL_MS;
  }
}
