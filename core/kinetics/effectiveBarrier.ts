import type { Finding, ResolvedPathway, ResolvedPoint } from '../profile/types.ts';
import type { PointRef } from './types.ts';

/** The barrier that governs a linear (non-cycle) profile and the states that set it. */
export interface EffectiveBarrier {
  /** max over TS j and minimum i at or before j of E_j − E_i, in J/mol. */
  barrierJ: number;
  /** The TS that sets it; for a barrierless step, the higher of its two minima. */
  ts: PointRef;
  /** True when `ts` stands for a barrierless step between two minima. */
  tsIsBarrierless: boolean;
  /** The minimum at or before the TS from which the barrier is measured. */
  intermediate: PointRef;
  /** Last minimum − first minimum, in J/mol. */
  reactionEnergyJ: number;
  /** The highest point of the pathway with its energy. */
  highest: PointRef & { energyJ: number };
}

const ref = (p: ResolvedPoint): PointRef => ({ id: p.id, label: p.label });

/**
 * Effective barrier of a linear profile: the largest rise from a minimum to a later (or the
 * same step's) TS, found in one pass with a running minimum, O(N). Two minima in a row count
 * as a barrierless step whose top is the higher one. Unknown energies give a finding and no
 * result: a missing TS could be the one that decides.
 */
export function effectiveBarrier(pathway: ResolvedPathway): { result: EffectiveBarrier | null; findings: Finding[] } {
  const missing = pathway.points.filter((p) => p.energyJ === null);
  if (missing.length > 0) {
    const names = missing.map((p) => `"${p.label}"`).join(', ');
    return { result: null, findings: [{ severity: 'warning', code: 'energy-missing', message: `effective barrier of "${pathway.name}" needs every energy; unknown: ${names}`, pathway: pathway.id, point: missing[0]?.id }] };
  }
  let lowest: ResolvedPoint | null = null;
  let previous: ResolvedPoint | null = null;
  let best: Candidate | null = null;
  let first: ResolvedPoint | null = null;
  let last: ResolvedPoint | null = null;
  let highest: ResolvedPoint | null = null;
  for (const p of pathway.points) {
    const e = p.energyJ as number;
    if (highest === null || e > (highest.energyJ as number)) highest = p;
    if (p.kind === 'ts') {
      if (lowest !== null) best = better(best, e - (lowest.energyJ as number), p, lowest, false);
    } else {
      if (previous?.kind === 'min' && lowest !== null) {
        const top = e > (previous.energyJ as number) ? p : previous;
        best = better(best, (top.energyJ as number) - (lowest.energyJ as number), top, lowest, true);
      }
      if (lowest === null || e < (lowest.energyJ as number)) lowest = p;
      first ??= p;
      last = p;
    }
    previous = p;
  }
  if (best === null || first === null || last === null || highest === null) {
    return { result: null, findings: [{ severity: 'warning', code: 'no-barrier', message: `pathway "${pathway.name}" has no step (it needs a minimum followed by a TS or another minimum)`, pathway: pathway.id }] };
  }
  return {
    result: {
      barrierJ: best.barrierJ, ts: ref(best.ts), tsIsBarrierless: best.barrierless, intermediate: ref(best.from),
      reactionEnergyJ: (last.energyJ as number) - (first.energyJ as number),
      highest: { ...ref(highest), energyJ: highest.energyJ as number },
    },
    findings: [],
  };
}

interface Candidate {
  barrierJ: number;
  ts: ResolvedPoint;
  from: ResolvedPoint;
  barrierless: boolean;
}

// Ties keep the earlier TS.
function better(current: Candidate | null, barrierJ: number, ts: ResolvedPoint, from: ResolvedPoint, barrierless: boolean): Candidate {
  return current !== null && current.barrierJ >= barrierJ ? current : { barrierJ, ts, from, barrierless };
}
