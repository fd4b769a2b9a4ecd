import type { Document } from '../model/schema.ts';
import type { StructureTable } from './readStructures.ts';

/**
 * The document with each species' formula and charge taken from its structure (where the
 * structure could be read), so mass and charge balance need no typing. The stored document
 * is not changed: this copy is what gets resolved. Returns `doc` itself when no species has
 * a readable structure.
 */
export function withStructureFormulas(doc: Document, table: StructureTable): Document {
  let changed = false;
  const species = doc.species.map((s) => {
    const read = table.species.get(s.id);
    if (!read?.ok) return s;
    const { formula, composition } = read.value;
    if (s.formula === formula && s.charge === composition.charge) return s;
    changed = true;
    return { ...s, formula, charge: composition.charge };
  });
  return changed ? { ...doc, species } : doc;
}
