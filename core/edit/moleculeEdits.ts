import type { Document, Molecule } from '../model/schema.ts';
import { guessMoleculeFormat } from '../structure/guessMoleculeFormat.ts';

/**
 * Sets a species' structure from pasted or dropped text (format guessed, see
 * guessMoleculeFormat; a file name helps), or removes it when the text is blank. An XYZ
 * geometry keeps the species' typed charge. Returns `doc` itself when nothing changes.
 */
export function setSpeciesMolecule(doc: Document, args: { species: string; text: string; fileName?: string }): Document {
  const index = doc.species.findIndex((s) => s.id === args.species);
  if (index < 0) return doc;
  const old = doc.species[index]!;
  const text = args.text.trim();
  let molecule: Molecule | undefined;
  if (text !== '') {
    const format = guessMoleculeFormat(text, args.fileName);
    molecule = { format, text: format === 'smiles' ? text : args.text, ...(format === 'xyz' && old.charge !== undefined ? { charge: old.charge } : {}) };
  }
  if (molecule?.text === old.molecule?.text && molecule?.format === old.molecule?.format) return doc;
  const { molecule: _drop, ...rest } = old;
  const species = [...doc.species];
  species[index] = molecule ? { ...rest, molecule } : rest;
  return { ...doc, species };
}
