import type { Structure } from '../model/schema.ts';
import { readNumber } from '../import/delimited.ts';
import { columnByName, SPECIES_COLUMNS, type SpeciesColumn } from './speciesColumns.ts';
import { sigmaProblem } from './sigmaProblem.ts';

/** The cells of one conformer (structure) of a species. */
export type ConformerColumnKey = 'label' | 'electronic' | 'singlePoint' | 'hCorrection' | 'gCorrection' | 'sigma' | 'correctionSigma';

/** A column of a conformer table (the species sheet's own column, so titles and units agree). */
export type ConformerColumn = SpeciesColumn & { key: ConformerColumnKey };

const KEYS: readonly ConformerColumnKey[] = ['label', 'electronic', 'singlePoint', 'hCorrection', 'gCorrection', 'sigma', 'correctionSigma'];
const isConformerColumn = (c: SpeciesColumn | undefined): c is ConformerColumn => c !== undefined && (KEYS as readonly string[]).includes(c.key);

/** The conformer table's columns in order (a pasted block without a header fills them in this order). */
export const CONFORMER_COLUMNS: readonly ConformerColumn[] = SPECIES_COLUMNS.filter(isConformerColumn);

/** Text cells of one conformer. */
export type ConformerRow = Record<ConformerColumnKey, string>;

/** A bad cell of a conformer edit or paste: 0-based conformer row, the column, the text and why. */
export interface ConformerError {
  row: number;
  column: ConformerColumnKey;
  value: string;
  message: string;
}

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

/** The cells of a conformer. */
export function conformerRow(s: Structure | undefined): ConformerRow {
  return {
    label: s?.label ?? '', electronic: text(s?.electronic), singlePoint: text(s?.singlePoint), hCorrection: text(s?.hCorrection), gCorrection: text(s?.gCorrection),
    sigma: text(s?.sigma), correctionSigma: text(s?.correctionSigma),
  };
}

/** Finds a conformer column by key or title as a header might spell it ("G correction", "E"). */
export function conformerColumnByName(name: string): ConformerColumn | undefined {
  const column = columnByName(name);
  return isConformerColumn(column) ? column : undefined;
}

/**
 * Reads a conformer from its cells with the sheet's number reader (decimal comma, Unicode
 * minus). Every bad cell is reported, each message naming the column and the text.
 */
export function structureFromRow(row: ConformerRow, at: number): { structure: Structure | null; errors: ConformerError[] } {
  const errors: ConformerError[] = [];
  const structure: Partial<Structure> = {};
  const label = row.label.trim();
  if (label !== '') structure.label = label;
  for (const column of CONFORMER_COLUMNS) {
    const cell = row[column.key].trim();
    if (column.key === 'label' || cell === '') continue;
    const value = readNumber(cell, '\t');
    const refused = value === undefined ? `${column.title}: expected a number in hartree, got "${cell}"` : column.sigmaOf ? sigmaProblem(value, 'hartree', column.title) : null;
    if (refused !== null) errors.push({ row: at, column: column.key, value: cell, message: refused });
    else structure[column.key as Exclude<ConformerColumnKey, 'label'>] = value;
  }
  if (row.electronic.trim() === '') errors.push({ row: at, column: 'electronic', value: '', message: 'E: expected the electronic energy in hartree; every conformer needs one' });
  return errors.length > 0 ? { structure: null, errors } : { structure: structure as Structure, errors };
}
