import { join } from 'node:path';
import type { RecentFile } from '../ui/host/hostApi.ts';
import { readJsonFile, writeJsonFile } from './jsonFile.ts';
import { parseRecent, withoutRecent, withRecent } from './recentFiles.ts';

/** The operating system's own recent-documents list (macOS Dock and File menu, Windows jump list). */
export interface SystemRecent {
  add(path: string): void;
  clear(): void;
}

/**
 * The recent-documents list, kept in `recent-documents.json` in the app's data folder and
 * told to the system's list as well (which has no way to drop one entry, so `remove` only
 * changes ours).
 */
export class RecentStore {
  readonly #file: string;
  readonly #system: SystemRecent | undefined;
  #list: RecentFile[] = [];

  constructor(dataFolder: string, system?: SystemRecent) {
    this.#file = join(dataFolder, 'recent-documents.json');
    this.#system = system;
  }

  /** Reads the stored list (a missing or damaged file gives an empty list). */
  async load(): Promise<RecentFile[]> {
    this.#list = parseRecent(await readJsonFile(this.#file));
    return this.list();
  }

  /** Newest first. */
  list(): RecentFile[] {
    return this.#list.map((entry) => ({ ...entry }));
  }

  /** True when `path` is on the list. */
  has(path: string): boolean {
    return this.#list.some((entry) => entry.path === path);
  }

  /** Puts `path` first and stores the list. */
  async add(path: string): Promise<void> {
    this.#list = withRecent(this.#list, path);
    this.#system?.add(path);
    await writeJsonFile(this.#file, this.#list);
  }

  /** Takes `path` off the list and stores it. */
  async remove(path: string): Promise<void> {
    this.#list = withoutRecent(this.#list, path);
    await writeJsonFile(this.#file, this.#list);
  }

  /** Empties the list. */
  async clear(): Promise<void> {
    this.#list = [];
    this.#system?.clear();
    await writeJsonFile(this.#file, this.#list);
  }
}
