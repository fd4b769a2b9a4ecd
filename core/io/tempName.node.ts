import { basename, dirname, join } from 'node:path';

const TAG = /^[0-9a-f]{12}$/;

/** The temporary file `atomicWrite` writes next to `target`: `.<basename>.<12 lowercase hex>.tmp`. */
export function tempPathFor(target: string, tag: string): string {
  return join(dirname(target), `.${basename(target)}.${tag}.tmp`);
}

/** Whether a file name in `target`'s folder is one of `target`'s temporary files (exactly that pattern). */
export function isTempNameOf(name: string, target: string): boolean {
  const prefix = `.${basename(target)}.`;
  if (!name.startsWith(prefix) || !name.endsWith('.tmp')) return false;
  return TAG.test(name.slice(prefix.length, -'.tmp'.length));
}
