import type { Document, Molecule } from '../model/schema.ts';
import { guessMoleculeFormat } from '../structure/guessMoleculeFormat.ts';

/**
 * `item` with its structure set from pasted or dropped text (format guessed, see
 * guessMoleculeFormat; a file name helps), or without one when the text is blank; `item`
 * itself when nothing changes. An XYZ geometry carries `charge` (a species' typed charge).
 */
export function withMoleculeText<T extends { molecule?: Molecule }>(item: T, args: { text: string; fileName?: string; charge?: number }): T {
  const text = args.text.trim();
  let molecule: Molecule | undefined;
  if (text !== '') {
    const format = guessMoleculeFormat(text, args.fileName);
    molecule = { format, text: format === 'smiles' ? text : args.text, ...(format === 'xyz' && args.charge !== undefined ? { charge: args.charge } : {}) };
  }
  if (molecule?.text === item.molecule?.text && molecule?.format === item.molecule?.format) return item;
  const { molecule: _drop, ...rest } = item;
  return (molecule ? { ...rest, molecule } : rest) as T;
}

/**
 * Sets a species' structure from pasted or dropped text, or removes it when the text is
 * blank (see {@link withMoleculeText}); an XYZ geometry keeps the species' typed charge.
 * Returns `doc` itself when nothing changes.
 */
export function setSpeciesMolecule(doc: Document, args: { species: string; text: string; fileName?: string }): Document {
  const index = doc.species.findIndex((s) => s.id === args.species);
  if (index < 0) return doc;
  const old = doc.species[index]!;
  const next = withMoleculeText(old, { ...args, ...(old.charge !== undefined ? { charge: old.charge } : {}) });
  if (next === old) return doc;
  const species = [...doc.species];
  species[index] = next;
  return { ...doc, species };
}
