import type { ResolvedPathway, ResolvedPoint } from '../profile/types.ts';

/** One elementary step: minimum → (TS) → minimum; `ts` is null for a barrierless step. */
export interface StepShape {
  /** 0-based position of the step along the pathway. */
  index: number;
  from: ResolvedPoint;
  ts: ResolvedPoint | null;
  to: ResolvedPoint;
}

/**
 * A point order that cannot form a step: a TS before the first minimum or after the last
 * one, or a second TS (`extraTs`) after `ts` on the way from `from` to `to`.
 */
export type StepProblem =
  | { kind: 'starts-with-ts' | 'ends-with-ts'; ts: ResolvedPoint }
  | { kind: 'consecutive-ts'; ts: ResolvedPoint; extraTs: ResolvedPoint; from: ResolvedPoint; to: ResolvedPoint };

/**
 * Splits a pathway's points into steps minimum → (TS) → minimum. Two consecutive minima
 * make a barrierless step. A TS before the first minimum, after the last one, or two TSs
 * in a row cannot form a step: each is returned as a problem and the step is left out.
 * Callers word the problems as findings (`splitSteps` here, microkinetics its own).
 */
export function stepShapes(pathway: ResolvedPathway): { steps: StepShape[]; problems: StepProblem[] } {
  const steps: StepShape[] = [];
  const problems: StepProblem[] = [];
  let from: ResolvedPoint | null = null;
  let ts: ResolvedPoint | null = null;
  let extraTs: ResolvedPoint | null = null;
  for (const point of pathway.points) {
    if (point.kind === 'ts') {
      if (from === null) problems.push({ kind: 'starts-with-ts', ts: point });
      else if (ts === null) ts = point;
      else extraTs ??= point;
      continue;
    }
    if (from !== null) {
      if (ts !== null && extraTs !== null) problems.push({ kind: 'consecutive-ts', ts, extraTs, from, to: point });
      else steps.push({ index: steps.length, from, ts, to: point });
    }
    from = point;
    ts = null;
    extraTs = null;
  }
  if (ts !== null) problems.push({ kind: 'ends-with-ts', ts });
  return { steps, problems };
}
