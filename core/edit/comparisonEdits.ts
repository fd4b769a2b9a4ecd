import type { Comparison, Document } from '../model/schema.ts';

/**
 * Adds a comparison: the rate enhancement of `candidate` over `baseline`, or the
 * selectivity between competing pathways. Unknown pathways, a pathway compared with
 * itself and a comparison already present leave the document as it is.
 */
export function addComparison(doc: Document, args: { comparison: Comparison }): Document {
  const c = args.comparison;
  const ids = new Set(doc.pathways.map((p) => p.id));
  const named = c.type === 'rate' ? [c.baseline, c.candidate] : c.pathways;
  if (named.some((id) => !ids.has(id)) || new Set(named).size !== named.length || named.length < 2) return doc;
  const key = JSON.stringify(c);
  if (doc.comparisons.some((d) => JSON.stringify(d) === key)) return doc;
  return { ...doc, comparisons: [...doc.comparisons, c] };
}

/** Removes the comparison at `index`. */
export function removeComparison(doc: Document, args: { index: number }): Document {
  if (args.index < 0 || args.index >= doc.comparisons.length) return doc;
  return { ...doc, comparisons: doc.comparisons.filter((_, i) => i !== args.index) };
}
