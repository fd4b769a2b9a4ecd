import { pointComposition } from '../model/composition.ts';
import type { Pathway, Point } from '../model/schema.ts';
import type { StepMolecularity } from '../kinetics/types.ts';

/** Number of separate molecules in a state (counts included), or undefined without a composition. */
function moleculeCount(point: Point | undefined): number | undefined {
  const terms = point && pointComposition(point);
  return terms?.reduce((n, t) => n + t.count, 0);
}

/**
 * Molecularity of each step from the compositions of its states: the molecules that meet in
 * the TS, m = n(start) − n(TS) + 1 (A + B → [AB]‡ gives 2), each way. Steps are keyed as the
 * kinetics expects (the TS id, or the end minimum of a barrierless step); steps whose states
 * have no compositions are left out and default to first order.
 */
export function molecularityFromCompositions(pathway: Pathway): Record<string, StepMolecularity> {
  const result: Record<string, StepMolecularity> = {};
  const points = pathway.points;
  for (let i = 1; i < points.length; i++) {
    const point = points[i]!;
    if (point.kind === 'ts') {
      const before = moleculeCount(points[i - 1]), top = moleculeCount(point), after = moleculeCount(points[i + 1]);
      if (before !== undefined && top !== undefined && after !== undefined) {
        result[point.id] = { forward: before - top + 1, reverse: after - top + 1 };
      }
    } else if (points[i - 1]?.kind === 'min') {
      const before = moleculeCount(points[i - 1]), after = moleculeCount(point);
      if (before !== undefined && after !== undefined) {
        result[point.id] = { forward: Math.max(1, before - after + 1), reverse: Math.max(1, after - before + 1) };
      }
    }
  }
  return result;
}
