import { pointComposition } from '../../model/composition.ts';
import type { Point, SpeciesTerm } from '../../model/schema.ts';
import type { Finding } from '../types.ts';
import { showEnergy, type CheckInput } from './checkContext.ts';

/** Tolerance for one state drawn at two energies: 0.01 kcal/mol, below any reported digit (common practice for 1–2 decimals). */
const SHARED_TOLERANCE_J = 41.84;

function compositionKey(terms: readonly SpeciesTerm[] | undefined): string | undefined {
  if (!terms) return undefined;
  return terms.map((t) => `${t.species}*${t.count}`).sort().join('+');
}

/** Identity of a state: its kind and composition, or its label when no composition is given. */
function stateKey(p: Point): string {
  return `${p.kind}|${compositionKey(pointComposition(p)) ?? `label:${p.label.trim()}`}`;
}

/**
 * A state that appears in two pathways (same kind and composition, or same label where no
 * composition is given) must have one
 * energy. Only pathways that share their reference are compared: a shared reference point,
 * or first points that are the same state.
 */
export function checkSharedStates({ doc, pathways }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  const shared = doc.settings.reference.kind === 'point';
  for (let a = 0; a < doc.pathways.length; a++) {
    for (let b = a + 1; b < doc.pathways.length; b++) {
      const pa = doc.pathways[a]!, pb = doc.pathways[b]!;
      if (!shared && !(pa.points[0] && pb.points[0] && stateKey(pa.points[0]) === stateKey(pb.points[0]))) continue;
      const indexInB = new Map(pb.points.map((p, j) => [stateKey(p), j] as const));
      pa.points.forEach((point, i) => {
        const j = indexInB.get(stateKey(point)) ?? -1;
        const ea = pathways[a]!.points[i]!.energyJ, eb = j < 0 ? null : pathways[b]!.points[j]!.energyJ;
        if (ea === null || eb === null || Math.abs(ea - eb) <= SHARED_TOLERANCE_J) return;
        findings.push({
          severity: 'warning', code: 'shared-state-mismatch', pathway: pb.id, point: pb.points[j]!.id,
          message: `"${point.label}" is ${showEnergy(doc, ea)} in "${pa.name}" but ${showEnergy(doc, eb)} in "${pb.name}"`,
        });
      });
    }
  }
  return findings;
}
