/**
 * An id made from `stem` (lower-case letters, digits, dashes) that is not in `taken`:
 * "TS 2" -> "ts-2", then "ts-2-2", "ts-2-3", ... when already used.
 */
export function uniqueId(stem: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  const base = stem.normalize('NFKD').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 40) || 'item';
  if (!used.has(base)) return base;
  for (let n = 2; ; n++) if (!used.has(`${base}-${n}`)) return `${base}-${n}`;
}
