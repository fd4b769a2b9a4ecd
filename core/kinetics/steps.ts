import type { Finding, ResolvedPathway } from '../profile/types.ts';
import { stepShapes, type StepProblem, type StepShape } from './stepShapes.ts';

export type { StepShape } from './stepShapes.ts';

function describeProblem(pathway: ResolvedPathway, problem: StepProblem): Finding {
  const name = pathway.name;
  if (problem.kind === 'consecutive-ts') {
    const { ts, extraTs, from, to } = problem;
    return { severity: 'error', code: problem.kind, message: `pathway "${name}": TS "${ts.label}" and TS "${extraTs.label}" follow each other with no minimum between; the step "${from.label}" → "${to.label}" is left out`, pathway: pathway.id, point: extraTs.id };
  }
  const message = problem.kind === 'starts-with-ts'
    ? `pathway "${name}" starts with TS "${problem.ts.label}": a step needs a minimum before its TS`
    : `pathway "${name}" ends with TS "${problem.ts.label}": a step needs a minimum after its TS`;
  return { severity: 'error', code: problem.kind, message, pathway: pathway.id, point: problem.ts.id };
}

/** {@link stepShapes} with each problem as an error finding located at the offending TS. */
export function splitSteps(pathway: ResolvedPathway): { steps: StepShape[]; findings: Finding[] } {
  const { steps, problems } = stepShapes(pathway);
  return { steps, findings: problems.map((p) => describeProblem(pathway, p)) };
}
