import { pointComposition } from '../../model/composition.ts';
import { formationSumJ } from '../formationSum.ts';
import type { Finding } from '../types.ts';
import { showEnergy, type CheckInput } from './checkContext.ts';

/** Stepwise and Hess values further apart than 1 kcal/mol are flagged (common practice: about the accuracy of good DFT). */
const HESS_TOLERANCE_J = 4184;

/**
 * Where the first and last states of a pathway have compositions with formation data, the
 * pathway's overall energy (from its steps or species) should match the Hess's-law value.
 */
export function checkHessMismatch({ doc, pathways, ctx }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  doc.pathways.forEach((pathway, pi) => {
    const first = pathway.points[0], last = pathway.points.at(-1);
    if (!first || !last || first === last || last.energy.mode === 'formation') return;
    const a = pointComposition(first), b = pointComposition(last);
    if (!a || !b) return;
    const start = formationSumJ(a, ctx), end = formationSumJ(b, ctx);
    const e0 = pathways[pi]!.points[0]!.energyJ, e1 = pathways[pi]!.points.at(-1)!.energyJ;
    if (!start.ok || !end.ok || e0 === null || e1 === null) return;
    const hess = end.valueJ - start.valueJ, stepwise = e1 - e0;
    if (Math.abs(hess - stepwise) > HESS_TOLERANCE_J) {
      findings.push({
        severity: 'warning', code: 'hess-mismatch', pathway: pathway.id, point: last.id,
        message: `pathway "${pathway.name}" gives ${showEnergy(doc, stepwise)} from "${first.label}" to "${last.label}", but Hess's law from formation data gives ${showEnergy(doc, hess)}`,
      });
    }
  });
  return findings;
}
