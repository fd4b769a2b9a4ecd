import type { Document, Molecule } from '../model/schema.ts';
import type { StructureResult, StructureToolkit } from './structureToolkit.ts';

/** Every structure of a document as read by the toolkit, by species id and by point. */
export interface StructureTable {
  /** Toolkit name and version, for provenance. */
  toolkit: string;
  species: ReadonlyMap<string, StructureResult>;
  /** Keyed by {@link pointKey}. */
  points: ReadonlyMap<string, StructureResult>;
}

/** Key of a point in a {@link StructureTable}. */
export const pointKey = (pathway: string, point: string): string => `${pathway}\u0000${point}`;

/** True when any species or point of the document carries a structure. */
export function hasStructures(doc: Document): boolean {
  return doc.species.some((s) => s.molecule) || doc.pathways.some((p) => p.points.some((q) => q.molecule));
}

// Documents are immutable values: an edit elsewhere keeps a molecule's object, so it is read once.
const cache = new WeakMap<StructureToolkit, WeakMap<Molecule, StructureResult>>();

/** Reads one molecule with the (loaded) toolkit, once per molecule object. */
export function readMolecule(toolkit: StructureToolkit, molecule: Molecule): StructureResult {
  let seen = cache.get(toolkit);
  if (!seen) cache.set(toolkit, seen = new WeakMap());
  let result = seen.get(molecule);
  if (!result) seen.set(molecule, result = toolkit.read(molecule));
  return result;
}

/** Reads every structure of the document with the (loaded) toolkit; synchronous. */
export function readStructures(doc: Document, toolkit: StructureToolkit): StructureTable {
  const read = (m: Molecule) => readMolecule(toolkit, m);
  const species = new Map<string, StructureResult>();
  for (const s of doc.species) if (s.molecule) species.set(s.id, read(s.molecule));
  const points = new Map<string, StructureResult>();
  for (const p of doc.pathways) for (const q of p.points) if (q.molecule) points.set(pointKey(p.id, q.id), read(q.molecule));
  return { toolkit: toolkit.name, species, points };
}
