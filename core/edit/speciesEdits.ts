import type { Document, Species, SpeciesTerm } from '../model/schema.ts';
import { pastedBlock } from './pastedBlock.ts';
import { columnByName, SPECIES_COLUMNS, speciesRow, type SpeciesColumnKey, type SpeciesRow } from './speciesColumns.ts';
import { speciesFromRow } from './speciesFromRow.ts';
import { uniqueId } from './uniqueId.ts';

/** A bad cell of a sheet edit or paste: 0-based sheet row, the column, the text and why. */
export interface SheetError {
  row: number;
  column: SpeciesColumnKey;
  value: string;
  message: string;
}

/** The outcome of a sheet edit: the new document (the same one when refused) and any bad cells. */
export interface SheetEdit {
  doc: Document;
  errors: SheetError[];
}

const emptyRow = (): SpeciesRow => Object.fromEntries(SPECIES_COLUMNS.map((c) => [c.key, ''])) as SpeciesRow;

function renameTerms(terms: SpeciesTerm[], from: string, to: string): SpeciesTerm[] {
  return terms.some((t) => t.species === from) ? terms.map((t) => (t.species === from ? { ...t, species: to } : t)) : terms;
}

/** Points and a species-sum reference keep naming a species after its id changes. */
function renameSpecies(doc: Document, from: string, to: string): Document {
  const ref = doc.settings.reference;
  return {
    ...doc,
    settings: ref.kind === 'species' ? { ...doc.settings, reference: { ...ref, terms: renameTerms(ref.terms, from, to) } } : doc.settings,
    pathways: doc.pathways.map((pathway) => ({
      ...pathway,
      points: pathway.points.map((p) => {
        const e = p.energy;
        const energy = e.mode === 'species' || e.mode === 'formation' ? { ...e, terms: renameTerms(e.terms, from, to) } : e;
        return { ...p, energy, ...(p.composition ? { composition: renameTerms(p.composition, from, to) } : {}) };
      }),
    })),
  };
}

/**
 * Writes rows of cells into the sheet starting at `row` (rows past the end become new
 * species). All or nothing: when any cell is bad, every bad cell is reported and the
 * document is returned unchanged.
 */
export function writeSpeciesRows(doc: Document, row: number, rows: Partial<SpeciesRow>[]): SheetEdit {
  const errors: SheetError[] = [];
  const list = doc.species.slice();
  const renames: [string, string][] = [];
  rows.forEach((cells, i) => {
    const at = row + i;
    const base = list[at];
    const merged = { ...(base ? speciesRow(base) : emptyRow()), ...cells };
    if (!base && merged.id.trim() === '') merged.id = uniqueId(merged.label || `species ${at + 1}`, list.map((s) => s.id));
    if (!base && merged.label === '') merged.label = merged.id;
    const { species, problems } = speciesFromRow(merged, base);
    errors.push(...problems.map((p) => ({ ...p, row: at })));
    if (!species) return;
    if (list.some((s, k) => k !== at && s.id === species.id)) errors.push({ row: at, column: 'id', value: species.id, message: `species id "${species.id}" is already used` });
    if (base && base.id !== species.id) renames.push([base.id, species.id]);
    list[at] = species;
  });
  if (errors.length > 0) return { doc, errors };
  if (JSON.stringify(list) === JSON.stringify(doc.species)) return { doc, errors };
  let next: Document = { ...doc, species: list };
  for (const [from, to] of renames) next = renameSpecies(next, from, to);
  return { doc: next, errors };
}

/** Sets one cell of the species sheet. */
export function setSpeciesCell(doc: Document, args: { row: number; column: SpeciesColumnKey; text: string }): SheetEdit {
  return writeSpeciesRows(doc, args.row, [{ [args.column]: args.text }]);
}

/**
 * Pastes a tab-separated block (as a spreadsheet copies it) at a cell. A first line whose
 * cells all name sheet columns ("label", "E", "G correction", …) is a header that decides
 * where each column goes; otherwise columns fill the sheet from `column` rightwards.
 */
export function pasteSpecies(doc: Document, args: { text: string; row: number; column: SpeciesColumnKey }): SheetEdit {
  const { rows, stray } = pastedBlock(args.text, SPECIES_COLUMNS, columnByName, args.column);
  if (stray.length > 0) {
    return { doc, errors: stray.map((c) => ({
      row: args.row + c.row, column: SPECIES_COLUMNS.at(-1)!.key, value: c.value,
      message: c.headed ? `column ${c.column + 1} of the pasted block has no header` : `column ${c.column + 1} of the pasted block lies past the last sheet column`,
    })) };
  }
  return rows.length === 0 ? { doc, errors: [] } : writeSpeciesRows(doc, args.row, rows);
}

/** Adds an empty species at the end of the sheet. */
export function addSpecies(doc: Document, args: { label?: string } = {}): Document {
  const label = args.label ?? `S${doc.species.length + 1}`;
  const species: Species = { id: uniqueId(label, doc.species.map((s) => s.id)), label, phase: 'solute', structures: [] };
  return { ...doc, species: [...doc.species, species] };
}

/** Labels of the points (and the species-sum reference) that use a species, for "cannot delete" messages. */
export function speciesUsers(doc: Document, id: string): string[] {
  const ref = doc.settings.reference;
  const points = doc.pathways.flatMap((pathway) => pathway.points.filter((p) => {
    const e = p.energy;
    const terms = [...(e.mode === 'species' || e.mode === 'formation' ? e.terms : []), ...(p.composition ?? [])];
    return terms.some((t) => t.species === id);
  }).map((p) => `${pathway.name}: ${p.label}`));
  return ref.kind === 'species' && ref.terms.some((t) => t.species === id) ? [...points, 'the reference (what energies are measured from)'] : points;
}

/** Deletes a species no point uses (a used one stays; see {@link speciesUsers}). */
export function deleteSpecies(doc: Document, args: { species: string }): Document {
  if (!doc.species.some((s) => s.id === args.species) || speciesUsers(doc, args.species).length > 0) return doc;
  return { ...doc, species: doc.species.filter((s) => s.id !== args.species) };
}
