import { pointComposition } from '../../model/composition.ts';
import type { Finding } from '../types.ts';
import type { CheckInput } from './checkContext.ts';

/** "LA·AE′" -> "LA·AE": primes mark the regenerated state of the next turnover. */
function stripPrimes(label: string): string {
  return label.trim().replace(/[′'’″"*]+$/u, '').trim();
}

/**
 * A catalytic cycle ends at the regenerated first state, one turnover later (it sits at
 * ΔG_r, not at zero; REFERENCE.md §10). The last point must be a minimum that is recognisably
 * the first state: same label up to primes, or a composition that keeps a species of the first.
 */
export function checkCycleClosure({ doc }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  for (const pathway of doc.pathways) {
    if (!pathway.cycle) continue;
    const first = pathway.points[0], last = pathway.points.at(-1);
    if (!first || !last || pathway.points.length < 3) {
      findings.push({ severity: 'error', code: 'cycle-too-short', pathway: pathway.id, message: `catalytic cycle "${pathway.name}" needs at least an intermediate, a transition state and the regenerated intermediate` });
      continue;
    }
    const where = { pathway: pathway.id, point: last.id };
    if (first.kind !== 'min' || last.kind !== 'min') {
      findings.push({ severity: 'error', code: 'cycle-not-closed', ...where, message: `catalytic cycle "${pathway.name}" must start and end with a minimum (the last one is the regenerated first state)` });
      continue;
    }
    const a = pointComposition(first), b = pointComposition(last);
    const sharesSpecies = a !== undefined && b !== undefined && a.some((t) => b.some((u) => u.species === t.species));
    const sameLabel = stripPrimes(last.label).startsWith(stripPrimes(first.label));
    if (!sharesSpecies && !sameLabel) {
      findings.push({ severity: 'warning', code: 'cycle-not-closed', ...where, message: `the last point of catalytic cycle "${pathway.name}" should be the regenerated first state (e.g. "${stripPrimes(first.label)}′"); "${last.label}" does not look like it` });
    }
  }
  return findings;
}
