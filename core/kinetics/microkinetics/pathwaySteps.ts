import type { Finding, ResolvedPathway, ResolvedPoint } from '../../profile/types.ts';

/** One elementary step between consecutive minima, with the TS between them if any. */
export interface PathwayStep {
  from: ResolvedPoint & { energyJ: number };
  ts: (ResolvedPoint & { energyJ: number }) | undefined;
  to: ResolvedPoint & { energyJ: number };
}

type Known = ResolvedPoint & { energyJ: number };

/**
 * Splits a pathway into min → (TS) → min steps. Every point needs an energy, the pathway
 * must start and end on a minimum, and two TSs may not follow each other; each problem is
 * returned as an error finding located at its point.
 */
export function pathwaySteps(pathway: ResolvedPathway): { steps: PathwayStep[]; errors: Finding[] } {
  const errors: Finding[] = [];
  const at = (point: ResolvedPoint, code: string, message: string): void => {
    errors.push({ severity: 'error', code, message, pathway: pathway.id, point: point.id });
  };
  const known: Known[] = [];
  for (const p of pathway.points) {
    if (p.energyJ === null || !Number.isFinite(p.energyJ)) at(p, 'microkinetics-missing-energy', `"${p.label}" has no energy, so its rate constants cannot be computed`);
    else known.push(p as Known);
  }
  const steps: PathwayStep[] = [];
  const points = pathway.points;
  if (points.length < 2) errors.push({ severity: 'error', code: 'microkinetics-too-short', message: `pathway "${pathway.name}" needs at least two minima for a simulation`, pathway: pathway.id });
  const first = points[0];
  const last = points[points.length - 1];
  if (first && first.kind !== 'min') at(first, 'microkinetics-starts-with-ts', `pathway "${pathway.name}" starts with the transition state "${first.label}"; start it on a minimum`);
  if (last && last.kind !== 'min' && points.length > 1) at(last, 'microkinetics-ends-with-ts', `pathway "${pathway.name}" ends with the transition state "${last.label}"; end it on a minimum`);
  if (errors.length > 0) return { steps, errors };
  let from = known[0]!;
  let ts: Known | undefined;
  for (const p of known.slice(1)) {
    if (p.kind === 'ts') {
      if (ts) at(p, 'microkinetics-two-ts', `"${ts.label}" and "${p.label}" are two transition states in a row; put a minimum between them`);
      ts = p;
    } else {
      steps.push({ from, ts, to: p });
      from = p;
      ts = undefined;
    }
  }
  return { steps, errors };
}
