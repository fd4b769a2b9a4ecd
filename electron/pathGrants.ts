import { resolve } from 'node:path';

/**
 * Paths the user chose through the app's own dialogs. The renderer may ask to save back
 * to one of these without a dialog, and to no other path: a compromised renderer cannot
 * make the app write anywhere the user did not pick.
 */
export class PathGrants {
  readonly #paths = new Set<string>();

  /** Remembers a path the user picked. */
  grant(path: string): void {
    this.#paths.add(resolve(path));
  }

  /** True when `path` was picked by the user in this session. */
  allows(path: string): boolean {
    return this.#paths.has(resolve(path));
  }
}
