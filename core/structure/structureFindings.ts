import type { Document } from '../model/schema.ts';
import type { Finding } from '../profile/types.ts';
import { compareCompositions, describeComparison } from '../thermo/composition.ts';
import { parseFormula } from '../thermo/formula.ts';
import { pointKey, type StructureTable } from './readStructures.ts';

const signed = (q: number) => (q > 0 ? `+${q}` : q < 0 ? `−${-q}` : '0');

/**
 * Findings about structures: one that cannot be read (error, with the toolkit's reason),
 * and a typed formula or charge that disagrees with the species' structure (warning; the
 * structure's is used for mass balance).
 */
export function structureFindings(doc: Document, table: StructureTable): Finding[] {
  const findings: Finding[] = [];
  for (const s of doc.species) {
    const read = table.species.get(s.id);
    if (!read) continue;
    const name = `species "${s.label || s.id}"`;
    if (!read.ok) {
      findings.push({ severity: 'error', code: 'bad-structure', message: `${name}: the structure cannot be read (${read.message})` });
      continue;
    }
    const { formula, composition } = read.value;
    if (s.formula !== undefined && s.formula.trim() !== '') {
      const typed = parseFormula(s.formula, s.charge === undefined ? {} : { charge: s.charge });
      // A typed formula that does not parse is reported by the mass-balance check.
      if (typed.ok) {
        const diff = compareCompositions(typed.value, { counts: composition.counts, charge: typed.value.charge });
        if (!diff.equal) {
          findings.push({ severity: 'warning', code: 'structure-formula-mismatch', message: `${name}: the typed formula ${s.formula} has ${describeComparison(diff)} than the structure (${formula}); the structure's formula is used` });
          continue;
        }
      }
    }
    if (s.charge !== undefined && s.charge !== composition.charge) {
      findings.push({ severity: 'warning', code: 'structure-charge-mismatch', message: `${name}: the typed charge ${signed(s.charge)} disagrees with the structure's ${signed(composition.charge)}; the structure's charge is used` });
    }
  }
  for (const p of doc.pathways) for (const q of p.points) {
    const read = table.points.get(pointKey(p.id, q.id));
    if (read && !read.ok) findings.push({ severity: 'error', code: 'bad-structure', pathway: p.id, point: q.id, message: `"${q.label || q.id}": the structure cannot be read (${read.message})` });
  }
  return findings;
}
