import type { Finding, ResolvedPathway, ResolvedPoint } from '../profile/types.ts';

/** One elementary step: minimum → (TS) → minimum; `ts` is null for a barrierless step. */
export interface StepShape {
  /** 0-based position of the step along the pathway. */
  index: number;
  from: ResolvedPoint;
  ts: ResolvedPoint | null;
  to: ResolvedPoint;
}

/**
 * Splits a pathway's points into steps minimum → (TS) → minimum. Two consecutive minima
 * make a barrierless step. A TS before the first minimum, after the last one, or two TSs
 * in a row cannot form a step: each gives an error finding and is left out.
 */
export function splitSteps(pathway: ResolvedPathway): { steps: StepShape[]; findings: Finding[] } {
  const steps: StepShape[] = [];
  const findings: Finding[] = [];
  const where = (point: ResolvedPoint) => ({ pathway: pathway.id, point: point.id });
  let from: ResolvedPoint | null = null;
  let ts: ResolvedPoint | null = null;
  let extraTs: ResolvedPoint | null = null;
  for (const point of pathway.points) {
    if (point.kind === 'ts') {
      if (from === null) {
        findings.push({ severity: 'error', code: 'starts-with-ts', message: `pathway "${pathway.name}" starts with TS "${point.label}": a step needs a minimum before its TS`, ...where(point) });
      } else if (ts === null) ts = point;
      else extraTs ??= point;
      continue;
    }
    if (from !== null) {
      if (extraTs !== null) {
        findings.push({ severity: 'error', code: 'consecutive-ts', message: `pathway "${pathway.name}": TS "${ts?.label}" and TS "${extraTs.label}" follow each other with no minimum between; the step "${from.label}" → "${point.label}" is left out`, ...where(extraTs) });
      } else steps.push({ index: steps.length, from, ts, to: point });
    }
    from = point;
    ts = null;
    extraTs = null;
  }
  if (ts !== null) {
    findings.push({ severity: 'error', code: 'ends-with-ts', message: `pathway "${pathway.name}" ends with TS "${ts.label}": a step needs a minimum after its TS`, ...where(ts) });
  }
  return { steps, findings };
}
