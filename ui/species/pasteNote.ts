import type { Document } from '../../core/model/schema.ts';

/** What a paste into a sheet did, in one line: refused (with how many bad cells), no change, or done. */
export function pasteNote(result: { doc: Document; errors: readonly unknown[] }, before: Document): string {
  const bad = result.errors.length;
  if (bad > 0) return `Nothing was pasted: ${bad} cell${bad === 1 ? '' : 's'} could not be read.`;
  return result.doc === before ? 'The pasted block changes nothing.' : 'Pasted.';
}
