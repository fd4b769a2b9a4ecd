import type { Document, Species, Structure } from '../model/schema.ts';
import { pastedBlock } from './pastedBlock.ts';
import { CONFORMER_COLUMNS, conformerColumnByName, conformerRow, structureFromRow, type ConformerColumnKey, type ConformerError, type ConformerRow } from './conformerColumns.ts';

/** The outcome of a conformer edit: the new document (the same one when refused or unchanged) and any bad cells. */
export interface ConformerEdit {
  doc: Document;
  errors: ConformerError[];
}

/** Names a conformer of a species: the species id and the 0-based conformer row. */
export interface ConformerRef {
  species: string;
  row: number;
}

const sameStructure = (a: Structure, b: Structure | undefined) =>
  b !== undefined && CONFORMER_COLUMNS.every((c) => a[c.key] === b[c.key]);

/** Replaces a species' conformers, returning `doc` itself when they are the same. */
function withStructures(doc: Document, id: string, structures: Structure[]): Document {
  const at = doc.species.findIndex((s) => s.id === id);
  const old = doc.species[at];
  if (!old) return doc;
  if (structures.length === old.structures.length && structures.every((s, i) => sameStructure(s, old.structures[i]))) return doc;
  const species = doc.species.slice();
  species[at] = { ...old, structures };
  return { ...doc, species };
}

const findSpecies = (doc: Document, id: string): Species | undefined => doc.species.find((s) => s.id === id);

/** A label not yet used by the species' conformers: "a" → "a (copy)", "a (copy 2)", … (none stays none). */
function copyLabel(label: string | undefined, structures: readonly Structure[]): string | undefined {
  if (label === undefined) return undefined;
  const stem = label.replace(/ \(copy(?: \d+)?\)$/, '');
  const taken = new Set(structures.map((s) => s.label));
  for (let n = 1; ; n++) {
    const candidate = `${stem} (copy${n === 1 ? '' : ` ${n}`})`;
    if (!taken.has(candidate)) return candidate;
  }
}

function copyOf(source: Structure, structures: readonly Structure[]): Structure {
  const label = copyLabel(source.label, structures);
  const { label: _, ...rest } = source;
  return label === undefined ? rest : { label, ...rest };
}

/**
 * Adds a conformer at the end, a copy of the last one (its energies then edited in place).
 * A species without conformers is left alone: every conformer needs an electronic energy,
 * so the first one is typed in the species row or pasted (see {@link pasteConformers}).
 */
export function addConformer(doc: Document, args: { species: string }): Document {
  const species = findSpecies(doc, args.species);
  const last = species?.structures.at(-1);
  if (!species || !last) return doc;
  return withStructures(doc, species.id, [...species.structures, copyOf(last, species.structures)]);
}

/** Inserts a copy of a conformer right after it. */
export function duplicateConformer(doc: Document, args: ConformerRef): Document {
  const species = findSpecies(doc, args.species);
  const source = species?.structures[args.row];
  if (!species || !source) return doc;
  const structures = species.structures.slice();
  structures.splice(args.row + 1, 0, copyOf(source, species.structures));
  return withStructures(doc, species.id, structures);
}

/** Whether a conformer may be deleted: a species keeps at least one (its energy would go otherwise). */
export function canDeleteConformer(doc: Document, args: ConformerRef): boolean {
  const structures = findSpecies(doc, args.species)?.structures ?? [];
  return structures.length > 1 && args.row >= 0 && args.row < structures.length;
}

/** Deletes a conformer; the last one of a species stays (see {@link canDeleteConformer}). */
export function deleteConformer(doc: Document, args: ConformerRef): Document {
  if (!canDeleteConformer(doc, args)) return doc;
  return withStructures(doc, args.species, findSpecies(doc, args.species)!.structures.filter((_, i) => i !== args.row));
}

/**
 * Writes rows of cells into a species' conformers from `row` on (rows past the end become
 * new conformers and need an E). All or nothing: when any cell is bad, every bad cell is
 * reported and the document is returned unchanged.
 */
export function writeConformerRows(doc: Document, args: { species: string; row: number; rows: Partial<ConformerRow>[] }): ConformerEdit {
  const species = findSpecies(doc, args.species);
  if (!species) return { doc, errors: [] };
  const structures = species.structures.slice();
  const errors: ConformerError[] = [];
  args.rows.forEach((cells, i) => {
    const at = Math.min(args.row + i, structures.length);
    const { structure, errors: bad } = structureFromRow({ ...conformerRow(structures[at]), ...cells }, args.row + i);
    errors.push(...bad);
    if (structure) structures[at] = structure;
  });
  return errors.length > 0 ? { doc, errors } : { doc: withStructures(doc, species.id, structures), errors };
}

/** Sets one cell of a conformer from its text. */
export function setConformerCell(doc: Document, args: ConformerRef & { column: ConformerColumnKey; text: string }): ConformerEdit {
  return writeConformerRows(doc, { species: args.species, row: args.row, rows: [{ [args.column]: args.text }] });
}

/**
 * Pastes a tab-separated block of conformer rows at a cell (all or nothing). A first line
 * whose cells all name conformer columns ("label", "E", "G correction") is a header that
 * decides where each column goes; otherwise columns fill from `column` rightwards.
 */
export function pasteConformers(doc: Document, args: ConformerRef & { text: string; column: ConformerColumnKey }): ConformerEdit {
  const { rows, stray } = pastedBlock(args.text, CONFORMER_COLUMNS, conformerColumnByName, args.column);
  if (stray.length > 0) {
    return { doc, errors: stray.map((c) => ({
      row: args.row + c.row, column: CONFORMER_COLUMNS.at(-1)!.key, value: c.value,
      message: `column ${c.column + 1} of the pasted block lies past the last conformer column, got "${c.value}"`,
    })) };
  }
  return rows.length === 0 ? { doc, errors: [] } : writeConformerRows(doc, { species: args.species, row: args.row, rows });
}
