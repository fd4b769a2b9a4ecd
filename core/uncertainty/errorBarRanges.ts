import { errorBarKey, type ErrorBarRanges, type EnergyRange } from '../figure/errorBars.ts';
import type { UncertaintyResult } from './uncertaintyRun.ts';

/**
 * Error-bar ends of every resolved level from a Monte Carlo result, J/mol: the point
 * estimate ± the sample σ (`sigma`), or the 2.5–97.5 % interval (`interval`). Levels whose
 * energy does not vary get none.
 */
export function errorBarRanges(result: UncertaintyResult, mode: 'sigma' | 'interval'): ErrorBarRanges {
  const out = new Map<string, EnergyRange>();
  for (const q of result.quantities) {
    if (!q.at || q.point === null || !q.interval || q.interval.high === q.interval.low) continue;
    out.set(errorBarKey(q.at.pathway, q.at.point), mode === 'sigma' ? { low: q.point - q.interval.sd, high: q.point + q.interval.sd } : { low: q.interval.low, high: q.interval.high });
  }
  return out;
}
