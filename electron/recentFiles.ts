import { basename } from 'node:path';
import type { RecentFile } from '../ui/host/hostApi.ts';
import { IPC_PATH_CHARS } from '../ui/host/limits.ts';

/** How many documents the recent list keeps. */
export const MAX_RECENT = 10;

/** `list` with `path` first (moved there if it was already listed), at most {@link MAX_RECENT} long. */
export function withRecent(list: readonly RecentFile[], path: string): RecentFile[] {
  return [{ name: basename(path), path }, ...list.filter((entry) => entry.path !== path)].slice(0, MAX_RECENT);
}

/** `list` without `path` (a file that could not be opened any more). */
export function withoutRecent(list: readonly RecentFile[], path: string): RecentFile[] {
  return list.filter((entry) => entry.path !== path);
}

/** The recent list stored in `value`, keeping only well-formed entries (the file may be old or edited by hand). */
export function parseRecent(value: unknown): RecentFile[] {
  if (!Array.isArray(value)) return [];
  const paths = value
    .map((entry: unknown) => (typeof entry === 'object' && entry !== null ? (entry as { path?: unknown }).path : undefined))
    .filter((path): path is string => typeof path === 'string' && path.length > 0 && path.length <= IPC_PATH_CHARS);
  return paths.reduceRight<RecentFile[]>((list, path) => withRecent(list, path), []);
}
