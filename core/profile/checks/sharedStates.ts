import { pointComposition } from '../../model/composition.ts';
import type { Document, Point, SpeciesTerm } from '../../model/schema.ts';
import type { Finding } from '../types.ts';
import { showEnergy, type CheckInput } from './checkContext.ts';

/** Tolerance for one state drawn at two energies: 0.01 kcal/mol, below any reported digit (common practice for 1–2 decimals). */
const SHARED_TOLERANCE_J = 41.84;

/** How many distinct energies a message lists before "and N more". */
const LISTED = 6;

interface Occurrence { pathway: number; point: number; energyJ: number }

function compositionKey(terms: readonly SpeciesTerm[] | undefined): string | undefined {
  if (!terms) return undefined;
  return terms.map((t) => `${t.species}*${t.count}`).sort().join('+');
}

/** Identity of a state: its kind and composition, or its label when no composition is given. */
function stateKey(p: Point): string {
  return `${p.kind}|${compositionKey(pointComposition(p)) ?? `label:${p.label.trim()}`}`;
}

/**
 * Splits occurrences into energies that differ by more than the tolerance: sorted by energy,
 * a new group starts where a value lies beyond the tolerance of its group's lowest value.
 * Returns each occurrence's group number.
 */
function energyGroups(occurrences: readonly Occurrence[]): number[] {
  const order = occurrences.map((_, i) => i).sort((i, j) => occurrences[i]!.energyJ - occurrences[j]!.energyJ);
  const group = new Array<number>(occurrences.length);
  let count = -1, floor = -Infinity;
  for (const i of order) {
    const e = occurrences[i]!.energyJ;
    if (e - floor > SHARED_TOLERANCE_J) { count++; floor = e; }
    group[i] = count;
  }
  return group;
}

/** One finding for a state drawn at several energies, or null when all agree within the tolerance. */
function mismatch(doc: Document, occurrences: readonly Occurrence[]): Finding | null {
  const group = energyGroups(occurrences);
  // Each distinct energy is shown once, at its first occurrence in document order.
  const shown = new Set<number>();
  const firsts = occurrences.filter((_, i) => !shown.has(group[i]!) && shown.add(group[i]!));
  if (firsts.length < 2) return null;
  const at = (o: Occurrence) => doc.pathways[o.pathway]!;
  const first = occurrences[0]!, disagreeing = firsts[1]!;
  const listed = firsts.slice(0, LISTED).map((o) => `${showEnergy(doc, o.energyJ)} in "${at(o).name}"`);
  const more = firsts.length > LISTED ? `, and ${firsts.length - LISTED} more` : '';
  return {
    severity: 'warning', code: 'shared-state-mismatch', pathway: at(disagreeing).id, point: at(disagreeing).points[disagreeing.point]!.id,
    message: `"${at(first).points[first.point]!.label}" has ${firsts.length} different energies across pathways: ${listed.join(', ')}${more}`,
  };
}

/**
 * A state that appears in several pathways (same kind and composition, or same label where no
 * composition is given) must have one energy; each state drawn at more than one gives one
 * finding. Only pathways that share their reference are compared: a shared reference point,
 * or first points that are the same state. Within a pathway only a state's first occurrence
 * counts: a repeat is a duplicate label, or a cycle's regenerated first state, which lies
 * lower by the reaction energy. Linear in the number of points, apart from sorting each state's
 * occurrences by energy.
 */
export function checkSharedStates({ doc, pathways }: CheckInput): Finding[] {
  const shared = doc.settings.reference.kind === 'point';
  const byState = new Map<string, Occurrence[]>();
  doc.pathways.forEach((pathway, a) => {
    const start = pathway.points[0];
    if (!start) return;
    const group = shared ? '' : stateKey(start);
    const seen = new Set<string>();
    pathway.points.forEach((point, i) => {
      const key = stateKey(point);
      if (seen.has(key)) return;
      seen.add(key);
      const energyJ = pathways[a]!.points[i]!.energyJ;
      if (energyJ === null) return;
      const stateInGroup = `${group}\u0000${key}`;
      const list = byState.get(stateInGroup);
      if (list) list.push({ pathway: a, point: i, energyJ });
      else byState.set(stateInGroup, [{ pathway: a, point: i, energyJ }]);
    });
  });
  return [...byState.values()].flatMap((occurrences) => mismatch(doc, occurrences) ?? []);
}
