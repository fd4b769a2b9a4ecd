import { csvParseRows } from 'd3';
import { CALORIE_J } from '../units/constants.ts';
import type { FormationData, FormationKey, FormationValues } from './formationValues.ts';

import type { TableError as TableCellError } from '../import/tableError.ts';

/** A bad cell of a formation table; row is 1-based (the header is row 1). Same shape as a points-table error. */
export type { TableCellError };

/** A parsed formation table, values converted to kJ/mol and J/(mol K). */
export interface FormationTable {
  data: FormationData;
  /** Row number of each species, for messages. */
  rows: ReadonlyMap<string, number>;
  /** Which value columns the table has. */
  columns: FormationKey[];
}

/** Result of {@link parseFormationTable}. */
export type FormationTableResult = { ok: true; value: FormationTable } | { ok: false; errors: TableCellError[] };

const NAMES: Readonly<Record<string, FormationKey>> = {
  dfh: 'dfH', 'δfh': 'dfH', 'δfh°': 'dfH', dhf: 'dfH',
  s: 'S', 's°': 'S',
  dfg: 'dfG', 'δfg': 'dfG', 'δfg°': 'dfG', dgf: 'dfG',
};
// Factor from the written unit to kJ/mol (energies) or J/(mol K) (entropy).
const ENERGY_UNITS: Readonly<Record<string, number>> = { 'kj/mol': 1, 'kjmol-1': 1, 'kcal/mol': CALORIE_J, 'kcalmol-1': CALORIE_J };
const ENTROPY_UNITS: Readonly<Record<string, number>> = {
  'j/(molk)': 1, 'j/molk': 1, 'j/mol/k': 1, 'j/(kmol)': 1, 'jmol-1k-1': 1, 'jk-1mol-1': 1,
  'cal/(molk)': CALORIE_J, 'cal/molk': CALORIE_J, 'cal/mol/k': CALORIE_J, 'cal/(kmol)': CALORIE_J, 'calmol-1k-1': CALORIE_J, 'calk-1mol-1': CALORIE_J,
};
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

type Column = { key: FormationKey; factor: number; header: string };

function readHeader(cells: string[]): { ok: true; columns: Column[] } | { ok: false; errors: TableCellError[] } {
  const errors: TableCellError[] = [];
  const columns: Column[] = [];
  const first = (cells[0] ?? '').trim();
  if (first.toLowerCase() !== 'species') errors.push({ row: 1, column: first, value: first, message: `the first column must be 'species', got '${first}'` });
  for (const raw of cells.slice(1)) {
    const header = raw.trim();
    const m = /^(.*?)\s*\[(.*)\]$/.exec(header);
    const key = NAMES[(m?.[1] ?? header).toLowerCase().replace(/\s+/g, '')];
    if (key === undefined) {
      errors.push({ row: 1, column: header, value: header, message: `unknown column '${header}' (expected dfH, S or dfG with a unit, e.g. 'dfH [kJ/mol]')` });
      continue;
    }
    const unit = (m?.[2] ?? '').toLowerCase().replace(/\s+/g, '').replaceAll('⁻¹', '-1');
    const factor = (key === 'S' ? ENTROPY_UNITS : ENERGY_UNITS)[unit];
    if (factor === undefined) {
      const want = key === 'S' ? 'J/(mol K) or cal/(mol K)' : 'kJ/mol or kcal/mol';
      errors.push({ row: 1, column: header, value: header, message: m ? `unknown unit '${m[2]}' in column '${header}' (expected ${want})` : `column '${header}' needs a unit in brackets (${want})` });
      continue;
    }
    if (columns.some((c) => c.key === key)) errors.push({ row: 1, column: header, value: header, message: `two columns for ${key}` });
    columns.push({ key, factor, header });
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, columns };
}

/**
 * Parses a CSV table of standard formation data with header
 * `species,dfH [kJ/mol],S [J/(mol K)],dfG [kJ/mol]` (value columns optional, in any order;
 * kcal/mol and cal/(mol K) are converted with the thermochemical calorie, NIST SP 811).
 * Handles a byte-order mark, CRLF, quoted cells, blank lines, empty cells (value unknown)
 * and the typographic minus (−). Every bad cell is reported with its row and column.
 */
export function parseFormationTable(text: string): FormationTableResult {
  const rows = csvParseRows(text.replace(/^\uFEFF/, ''));
  const headerIndex = rows.findIndex((r) => r.some((c) => c.trim() !== ''));
  if (headerIndex < 0) return { ok: false, errors: [{ row: 1, column: '', value: '', message: 'the table is empty' }] };
  const header = readHeader(rows[headerIndex] ?? []);
  if (!header.ok) return { ok: false, errors: header.errors.map((e) => ({ ...e, row: headerIndex + 1 })) };
  const data = new Map<string, FormationValues>();
  const rowOf = new Map<string, number>();
  const errors: TableCellError[] = [];
  rows.forEach((cells, index) => {
    const row = index + 1;
    if (index <= headerIndex || cells.every((c) => c.trim() === '')) return;
    const species = (cells[0] ?? '').trim();
    if (species === '') { errors.push({ row, column: 'species', value: '', message: 'missing species name' }); return; }
    if (data.has(species)) { errors.push({ row, column: 'species', value: species, message: `species '${species}' is listed twice (rows ${rowOf.get(species)} and ${row})` }); return; }
    if (cells.length > header.columns.length + 1 && cells.slice(header.columns.length + 1).some((c) => c.trim() !== '')) {
      errors.push({ row, column: String(header.columns.length + 2), value: cells[header.columns.length + 1] ?? '', message: 'more cells than header columns' });
    }
    const values: FormationValues = {};
    header.columns.forEach((col, i) => {
      const value = (cells[i + 1] ?? '').trim();
      if (value === '') return;
      const normalised = value.replace(/^[−–]/, '-');
      if (!NUMBER.test(normalised)) { errors.push({ row, column: col.header, value, message: `'${value}' is not a number` }); return; }
      values[col.key] = Number(normalised) * col.factor;
    });
    data.set(species, values);
    rowOf.set(species, row);
  });
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, value: { data, rows: rowOf, columns: header.columns.map((c) => c.key) } };
}
