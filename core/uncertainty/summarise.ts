import { quantileSorted } from 'd3';

/** Median and 95 % interval (2.5th and 97.5th percentiles) of one sampled number. */
export interface Interval {
  median: number;
  low: number;
  high: number;
  /** Samples in which the number could be computed. */
  samples: number;
}

/**
 * Median and 2.5–97.5 % percentiles of the finite values (d3's quantileSorted: linear
 * interpolation between order statistics, Hyndman & Fan type 7), or null when none is finite.
 */
export function summarise(values: Float64Array): Interval | null {
  // d3 reads any indexable list; its types ask for an array.
  const finite = values.filter(Number.isFinite).sort() as unknown as number[];
  if (finite.length === 0) return null;
  const at = (p: number) => quantileSorted(finite, p)!;
  return { median: at(0.5), low: at(0.025), high: at(0.975), samples: finite.length };
}

/** Share of the samples in which each outcome occurred (null outcomes are not counted). */
export function frequencies(outcomes: readonly (string | null)[]): Record<string, number> {
  const counts: Record<string, number> = {};
  let n = 0;
  for (const o of outcomes) if (o !== null) { counts[o] = (counts[o] ?? 0) + 1; n++; }
  for (const k of Object.keys(counts)) counts[k] = counts[k]! / n;
  return counts;
}
