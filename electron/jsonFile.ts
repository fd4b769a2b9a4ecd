import { readFile } from 'node:fs/promises';
import { atomicWrite } from '../core/io/atomicWrite.node.ts';

/**
 * The parsed contents of a small JSON file the app keeps for itself, or `undefined` when
 * the file is missing or unreadable: such files only hold conveniences (window place,
 * recent list), so a damaged one is ignored and later replaced, never fatal.
 */
export async function readJsonFile(path: string): Promise<unknown> {
  try {
    return JSON.parse(await readFile(path, 'utf8')) as unknown;
  } catch {
    return undefined;
  }
}

/** Writes `value` as JSON, atomically (see {@link atomicWrite}). */
export async function writeJsonFile(path: string, value: unknown): Promise<void> {
  await atomicWrite(path, `${JSON.stringify(value, null, 2)}\n`);
}
