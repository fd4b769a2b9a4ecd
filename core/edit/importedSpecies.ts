import type { Document, Point, Species } from '../model/schema.ts';
import { uniqueId } from './uniqueId.ts';

/** Arguments of {@link addImportedSpecies}. */
export interface ImportedSpeciesArgs {
  species: readonly Species[];
  /**
   * Also add a pathway with one point per species in the given order; a species whose
   * frequencies have exactly one imaginary mode becomes a TS, every other a minimum.
   */
  pathwayName?: string;
}

/**
 * Adds species read from calculation outputs, all at once (one undo step), and optionally a
 * pathway through them. Ids that clash with existing ones get a suffix. The same document
 * when there is nothing to add.
 */
export function addImportedSpecies(doc: Document, args: ImportedSpeciesArgs): Document {
  if (args.species.length === 0) return doc;
  const taken = doc.species.map((s) => s.id);
  const added = args.species.map((s) => {
    const id = taken.includes(s.id) ? uniqueId(s.id, taken) : s.id;
    taken.push(id);
    return id === s.id ? s : { ...s, id };
  });
  const next: Document = { ...doc, species: [...doc.species, ...added] };
  if (args.pathwayName === undefined) return next;
  const points: Point[] = added.map((s, i) => {
    const imaginary = s.structures[0]?.frequencies?.filter((f) => f < 0).length;
    return { id: `p${i + 1}`, label: s.label, kind: imaginary === 1 ? 'ts' : 'min', energy: { mode: 'species', terms: [{ species: s.id, count: 1 }] } };
  });
  const pathwayId = uniqueId('pathway', doc.pathways.map((p) => p.id));
  return { ...next, pathways: [...next.pathways, { id: pathwayId, name: args.pathwayName, cycle: false, style: { visible: true }, points }] };
}
