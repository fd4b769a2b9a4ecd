import { pointComposition } from '../model/composition.ts';
import type { Document } from '../model/schema.ts';
import { pointKey, type StructureTable } from './readStructures.ts';
import type { Depiction } from './structureToolkit.ts';

/** What the figure draws at one point: the depiction and the side of the level it goes. */
export interface PointDrawing {
  depiction: Depiction;
  side: 'above' | 'below';
}

/**
 * The drawing for each point, keyed by pointKey: the point's own structure, else the
 * largest (most heavy atoms) of the structures of the species its state is made of —
 * the complex, not the water that leaves with it. Side: the point's choice, else the
 * figure's (default above). Empty when the figure hides drawings.
 */
export function pointDepictions(doc: Document, table: StructureTable): Map<string, PointDrawing> {
  const drawings = new Map<string, PointDrawing>();
  const options = doc.figure.molecules;
  if (options && !options.show) return drawings;
  for (const p of doc.pathways) for (const q of p.points) {
    const key = pointKey(p.id, q.id);
    const own = table.points.get(key);
    let depiction = own?.ok ? own.value.depiction : undefined;
    if (!own) {
      let heavy = -1;
      for (const term of pointComposition(q) ?? []) {
        const read = table.species.get(term.species);
        if (read?.ok && read.value.heavyAtoms > heavy) { heavy = read.value.heavyAtoms; depiction = read.value.depiction; }
      }
    }
    if (depiction) drawings.set(key, { depiction, side: q.moleculeSide ?? options?.side ?? 'above' });
  }
  return drawings;
}
