import type { Point, SpeciesTerm } from './schema.ts';

/** The species a point's state is made of: its energy terms, else its declared composition. */
export function pointComposition(point: Point): readonly SpeciesTerm[] | undefined {
  const e = point.energy;
  if (e.mode === 'species' || e.mode === 'formation') return e.terms;
  return point.composition;
}
