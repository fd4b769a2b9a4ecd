import type { Document, SpeciesTerm } from '../model/schema.ts';
import { mapPoint } from './mapPathway.ts';
import type { PointRef } from './pointEdits.ts';

/**
 * Why a composition is not acceptable for this document (an unknown species, a count
 * that is not a positive number), or null when it is.
 */
export function compositionProblem(doc: Document, terms: readonly SpeciesTerm[]): string | null {
  const ids = new Set(doc.species.map((s) => s.id));
  for (const [i, t] of terms.entries()) {
    if (!ids.has(t.species)) return `composition term ${i + 1}: no species with id "${t.species}"`;
    if (!Number.isFinite(t.count) || t.count <= 0) return `composition term ${i + 1}: the count of ${t.species} must be a positive number, got ${t.count}`;
  }
  return null;
}

/**
 * Sets what a point's state is made of (species and counts), used for mass balance, Hess
 * checks and molecularity. Terms naming the same species are merged; an empty list or
 * `null` removes the composition. A composition {@link compositionProblem} refuses
 * leaves the document as it is.
 */
export function setComposition(doc: Document, args: PointRef & { terms: readonly SpeciesTerm[] | null }): Document {
  const terms = args.terms ?? [];
  if (compositionProblem(doc, terms)) return doc;
  const merged = new Map<string, number>();
  for (const t of terms) merged.set(t.species, (merged.get(t.species) ?? 0) + t.count);
  const next = [...merged].map(([species, count]) => ({ species, count }));
  return mapPoint(doc, args.pathway, args.point, (p) => {
    if (next.length === 0) {
      if (!p.composition) return p;
      const { composition: _c, ...rest } = p;
      return rest;
    }
    return JSON.stringify(p.composition) === JSON.stringify(next) ? p : { ...p, composition: next };
  });
}
