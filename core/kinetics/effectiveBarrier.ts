import type { Finding, ResolvedPathway, ResolvedPoint } from '../profile/types.ts';
import type { PointRef } from './types.ts';
import { tsTopEnergies } from './tsTopEnergies.ts';

/** The barrier that governs a linear (non-cycle) profile and the states that set it. */
export interface EffectiveBarrier {
  /** max over TS j and minimum i at or before j of E_j − E_i, in J/mol. */
  barrierJ: number;
  /** The TS that sets it; for a barrierless step, the higher of its two minima. */
  ts: PointRef;
  /** True when `ts` stands for a barrierless step between two minima. */
  tsIsBarrierless: boolean;
  /**
   * True when the TS lies below a neighbouring minimum and the barrier is measured to the TS
   * raised to that minimum (the rule step rates use, `stepTopEnergy`).
   */
  tsRaised: boolean;
  /** The energy the barrier is measured to (the TS, or the TS raised to its higher neighbour), J/mol. */
  topJ: number;
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
 * as a barrierless step whose top is the higher one; a TS below a neighbouring minimum is
 * raised to it, as for the step rates (`tsTopEnergies`). Unknown energies give a finding and no
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
  const tops = tsTopEnergies(pathway.points);
  for (let i = 0; i < pathway.points.length; i++) {
    const p = pathway.points[i]!;
    const e = p.energyJ as number;
    if (highest === null || e > (highest.energyJ as number)) highest = p;
    if (p.kind === 'ts') {
      const top = tops[i] as number;
      if (lowest !== null) best = better(best, top - (lowest.energyJ as number), p, lowest, false, top, top > e);
    } else {
      if (previous?.kind === 'min' && lowest !== null) {
        const top = e > (previous.energyJ as number) ? p : previous;
        best = better(best, (top.energyJ as number) - (lowest.energyJ as number), top, lowest, true, top.energyJ as number, false);
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
      barrierJ: best.barrierJ, ts: ref(best.ts), tsIsBarrierless: best.barrierless, tsRaised: best.raised, topJ: best.topJ, intermediate: ref(best.from),
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
  topJ: number;
  raised: boolean;
}

// Ties keep the earlier TS.
function better(current: Candidate | null, barrierJ: number, ts: ResolvedPoint, from: ResolvedPoint, barrierless: boolean, topJ: number, raised: boolean): Candidate {
  return current !== null && current.barrierJ >= barrierJ ? current : { barrierJ, ts, from, barrierless, topJ, raised };
}
