import type { Finding, ResolvedPathway, ResolvedPoint } from '../../profile/types.ts';
import { stepShapes, type StepProblem } from '../stepShapes.ts';

type Known = ResolvedPoint & { energyJ: number };

/** One elementary step between consecutive minima, with the TS between them if any. */
export interface PathwayStep {
  from: Known;
  ts: Known | null;
  to: Known;
}

/**
 * Splits a pathway into min → (TS) → min steps with the shared {@link stepShapes}. Every point
 * needs an energy, the pathway must start and end on a minimum, and two TSs may not follow
 * each other; each problem is returned as an error finding located at its point, with the
 * simulation's own codes and wording, and then no steps are returned.
 */
export function pathwaySteps(pathway: ResolvedPathway): { steps: PathwayStep[]; errors: Finding[] } {
  const errors: Finding[] = [];
  const at = (point: ResolvedPoint, code: string, message: string): void => {
    errors.push({ severity: 'error', code, message, pathway: pathway.id, point: point.id });
  };
  for (const p of pathway.points) {
    if (p.energyJ === null || !Number.isFinite(p.energyJ)) at(p, 'microkinetics-missing-energy', `"${p.label}" has no energy, so its rate constants cannot be computed`);
  }
  const points = pathway.points;
  if (points.length < 2) errors.push({ severity: 'error', code: 'microkinetics-too-short', message: `pathway "${pathway.name}" needs at least two minima for a simulation`, pathway: pathway.id });
  const { steps, problems } = stepShapes(pathway);
  // As before the shared split: an open end hides any TS pair inside, so that is reported alone.
  for (const problem of problems) if (problem.kind !== 'consecutive-ts') describe(pathway, problem, at);
  if (errors.length === 0) for (const problem of problems) if (problem.kind === 'consecutive-ts') describe(pathway, problem, at);
  return errors.length > 0 ? { steps: [], errors } : { steps: steps as PathwayStep[], errors };
}

// A leading or trailing run of TSs is one finding at the pathway's first or last point.
function describe(pathway: ResolvedPathway, problem: StepProblem, at: (point: ResolvedPoint, code: string, message: string) => void): void {
  const points = pathway.points;
  if (problem.kind === 'consecutive-ts') {
    at(problem.extraTs, 'microkinetics-two-ts', `"${problem.ts.label}" and "${problem.extraTs.label}" are two transition states in a row; put a minimum between them`);
  } else if (problem.kind === 'starts-with-ts') {
    const first = points[0]!;
    if (problem.ts === first) at(first, 'microkinetics-starts-with-ts', `pathway "${pathway.name}" starts with the transition state "${first.label}"; start it on a minimum`);
  } else {
    const last = points[points.length - 1]!;
    at(last, 'microkinetics-ends-with-ts', `pathway "${pathway.name}" ends with the transition state "${last.label}"; end it on a minimum`);
  }
}
