import { pointComposition } from '../../model/composition.ts';
import type { Document, SpeciesTerm } from '../../model/schema.ts';
import { compareCompositions, describeComparison, sumCompositions, type Composition } from '../../thermo/composition.ts';
import { parseFormula } from '../../thermo/formula.ts';
import type { Finding } from '../types.ts';
import type { CheckInput } from './checkContext.ts';

type StateComposition = { ok: true; value: Composition } | { ok: false; species?: string; message?: string };

function stateComposition(doc: Document, terms: readonly SpeciesTerm[]): StateComposition {
  const parts: { formula: Composition; count: number }[] = [];
  for (const term of terms) {
    const species = doc.species.find((s) => s.id === term.species)!;
    if (!species.formula) return { ok: false, species: species.label };
    const parsed = parseFormula(species.formula, species.charge === undefined ? {} : { charge: species.charge });
    if (!parsed.ok) return { ok: false, species: species.label, message: `formula "${species.formula}": ${parsed.error.message}` };
    parts.push({ formula: parsed.value, count: term.count });
  }
  return { ok: true, value: sumCompositions(parts) };
}

function referenceTerms(doc: Document, pathwayIndex: number): { terms: readonly SpeciesTerm[]; label: string } | undefined {
  const ref = doc.settings.reference;
  const point = ref.kind === 'point'
    ? doc.pathways.find((p) => p.id === ref.pathway)?.points.find((p) => p.id === ref.point)
    : doc.pathways[pathwayIndex]!.points[0];
  const terms = point && pointComposition(point);
  return terms && point ? { terms, label: point.label } : undefined;
}

/**
 * Every state must hold the same atoms and charge as the reference state: species that
 * enter or leave are part of the state (REFERENCE.md §10, mass balance along the profile).
 */
export function checkMassBalance({ doc }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  const badFormula = new Set<string>();
  doc.pathways.forEach((pathway, pi) => {
    const ref = referenceTerms(doc, pi);
    if (!ref) return;
    const refComposition = stateComposition(doc, ref.terms);
    if (!refComposition.ok) {
      if (refComposition.message && !badFormula.has(refComposition.species!)) {
        badFormula.add(refComposition.species!);
        findings.push({ severity: 'error', code: 'bad-formula', pathway: pathway.id, message: `species "${refComposition.species}": ${refComposition.message}` });
      }
      return;
    }
    for (const point of pathway.points) {
      const terms = pointComposition(point);
      if (!terms) continue;
      const state = stateComposition(doc, terms);
      if (!state.ok) {
        if (state.message && !badFormula.has(state.species!)) {
          badFormula.add(state.species!);
          findings.push({ severity: 'error', code: 'bad-formula', pathway: pathway.id, point: point.id, message: `species "${state.species}": ${state.message}` });
        }
        continue;
      }
      const diff = compareCompositions(state.value, refComposition.value);
      const where = { pathway: pathway.id, point: point.id };
      if (diff.differences.length > 0) {
        findings.push({ severity: 'error', code: 'mass-imbalance', ...where, message: `"${point.label}" has ${describeComparison({ ...diff, chargeDifference: 0 })} than the reference "${ref.label}"` });
      }
      if (diff.chargeDifference !== 0) {
        findings.push({ severity: 'error', code: 'charge-imbalance', ...where, message: `"${point.label}" has ${describeComparison({ ...diff, differences: [] })} than the reference "${ref.label}"` });
      }
    }
  });
  return findings;
}
