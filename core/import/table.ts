import { makeDocument } from '../model/load.ts';
import { sigmaProblem } from '../edit/sigmaProblem.ts';
import type { Document, EnergySpec, Estimate, Quantity, Unit } from '../model/schema.ts';
import { parseEnergyUnit } from '../units/energy.ts';
import { readDelimited, readNumber } from './delimited.ts';
import { rateColumnOf, rateHeaderProblem, readRateEstimate, type RateColumn } from './tableEstimate.ts';
import type { TableError } from './tableError.ts';

export type { TableError } from './tableError.ts';

export type TableImport = { ok: true; doc: Document } | { ok: false; errors: TableError[] };

const KNOWN = ['pathway', 'label', 'kind', 'cycle', 'sigma', 'reference'] as const;
const ENERGY_HEADER = /^([EHG])\s*\[(.+)\]$/;

interface Columns { pathway: number; label: number; kind: number; cycle: number; sigma: number; reference: number; energy: number; quantity: Quantity; unit: Unit; rate: Partial<Record<RateColumn, number>> }

function readHeader(cells: string[], line: number): Columns | TableError[] {
  const errors: TableError[] = [];
  const at: Partial<Record<string, number>> = {};
  const rate: Partial<Record<RateColumn, number>> = {};
  let energy: { index: number; quantity: Quantity; unit: Unit } | undefined;
  cells.forEach((cell, index) => {
    const name = cell.toLowerCase();
    const match = ENERGY_HEADER.exec(cell);
    const rateColumn = rateColumnOf(cell);
    const rateProblem = rateHeaderProblem(cell);
    if ((KNOWN as readonly string[]).includes(name)) at[name] = index;
    else if (rateColumn) rate[rateColumn] = index;
    else if (rateProblem) errors.push({ row: line, column: cell, value: cell, message: rateProblem });
    else if (match) {
      const unit = parseEnergyUnit(match[2]!);
      if (!unit) errors.push({ row: line, column: cell, value: match[2]!, message: 'unknown energy unit; use kcal/mol, kJ/mol, eV or hartree' });
      else if (energy) errors.push({ row: line, column: cell, value: cell, message: 'a second energy column; give one energy column per table' });
      else energy = { index, quantity: match[1] as Quantity, unit };
    } else {
      errors.push({ row: line, column: cell || `column ${index + 1}`, value: cell, message: 'unknown column; expected pathway, label, kind, cycle, sigma, reference, one energy column such as "G [kcal/mol]" and optionally k, k sigma, molecularity, half-life [s], half-life sigma [s]' });
    }
  });
  for (const name of ['pathway', 'label', 'kind'] as const) {
    if (at[name] === undefined) errors.push({ row: line, column: name, value: '', message: `missing the "${name}" column` });
  }
  if (!energy && !errors.some((e) => e.column.match(ENERGY_HEADER))) {
    errors.push({ row: line, column: 'energy', value: '', message: 'missing an energy column such as "G [kcal/mol]" (E, H or G, unit in brackets)' });
  }
  if (errors.length > 0 || !energy) return errors;
  return { pathway: at.pathway!, label: at.label!, kind: at.kind!, cycle: at.cycle ?? -1, sigma: at.sigma ?? -1, reference: at.reference ?? -1, energy: energy.index, quantity: energy.quantity, unit: energy.unit, rate };
}

function readCycle(cell: string): boolean | undefined {
  const v = cell.toLowerCase();
  if (['yes', 'y', 'true', '1'].includes(v)) return true;
  if (['no', 'n', 'false', '0', ''].includes(v)) return false;
  return undefined;
}

/**
 * Imports a table with one row per stationary point (header
 * `pathway,label,kind,G [kcal/mol],cycle`) into a new document. The reference: an optional
 * `reference` column with `yes` on one row makes that point the shared zero of every pathway;
 * without it the document-wide zero applies — typed values as typed, hartree values (absolute)
 * relative to the table's first row with an energy. Rate columns (core/import/tableEstimate.ts)
 * let a transition state give a k or half-life with σ instead. All or nothing: any bad row makes the whole import fail
 * with every problem listed.
 */
export function importTable(text: string, title = 'Imported table'): TableImport {
  const { delimiter, rows } = readDelimited(text);
  const header = rows[0];
  if (!header) return { ok: false, errors: [{ row: 1, column: '', value: '', message: 'the table is empty; expected a header row' }] };
  const columns = readHeader(header.cells, header.line);
  if (Array.isArray(columns)) return { ok: false, errors: columns };
  const errors: TableError[] = [];
  const pathways = new Map<string, { cycle: boolean | undefined; cycleRow: number; points: { label: string; kind: 'min' | 'ts'; value: number | undefined; estimate: Estimate | null; sigma: number | undefined }[] }>();
  let referenceRow: { line: number; pathway: string; index: number } | undefined;
  for (const { line, cells } of rows.slice(1)) {
    const cell = (i: number) => (i >= 0 ? cells[i] ?? '' : '');
    const fail = (column: string, value: string, message: string) => errors.push({ row: line, column, value, message });
    const errorsBefore = errors.length;
    if (cells.length > header.cells.length) fail(`column ${cells.length}`, cells.at(-1) ?? '', `this row has ${cells.length} cells but the header has ${header.cells.length}`);
    const name = cell(columns.pathway);
    if (!name) fail('pathway', '', 'expected a pathway name');
    const kindText = cell(columns.kind).toLowerCase();
    const kind = kindText === 'min' || kindText === 'ts' ? kindText : undefined;
    if (!kind) fail('kind', cell(columns.kind), 'expected "min" or "ts"');
    const energyHeader = header.cells[columns.energy]!;
    const energyUnit = energyHeader.replace(ENERGY_HEADER, '$2');
    // A transition state may give its barrier as a measured k or half-life instead (issue 18).
    const estimate = readRateEstimate((c) => cell(columns.rate[c] ?? -1), delimiter, fail);
    const value = estimate ? undefined : readNumber(cell(columns.energy), delimiter);
    if (estimate && cell(columns.energy) !== '') fail(energyHeader, cell(columns.energy), 'give either an energy or a rate constant/half-life on one row, not both');
    else if (estimate && kind === 'min') fail('kind', cell(columns.kind), 'a rate constant or half-life gives the barrier of a transition state; expected "ts"');
    else if (estimate === null && value === undefined) fail(energyHeader, cell(columns.energy), 'expected a number');
    const cycle = columns.cycle >= 0 ? readCycle(cell(columns.cycle)) : false;
    if (cycle === undefined) fail('cycle', cell(columns.cycle), 'expected yes or no');
    // σ is optional per row, in the energy column's unit (issue 18).
    const sigmaText = cell(columns.sigma);
    const sigma = sigmaText === '' ? undefined : readNumber(sigmaText, delimiter);
    const badNumber = sigmaText !== '' && (sigma === undefined || sigma < 0);
    const overBound = sigma !== undefined && !badNumber ? sigmaProblem(sigma, columns.unit) : null;
    if (badNumber) fail('sigma', sigmaText, `expected a standard uncertainty ≥ 0 in ${energyUnit}, or an empty cell`);
    else if (overBound) fail('sigma', sigmaText, overBound);
    else if (sigma !== undefined && estimate) fail('sigma', sigmaText, 'the sigma column is the energy\'s σ; give a rate constant\'s σ in "k sigma", a half-life\'s in "half-life sigma [s]"');
    if (!name || !kind || estimate === false || (!estimate && value === undefined) || cycle === undefined || errors.length > errorsBefore) continue;
    const entry = pathways.get(name) ?? { cycle: undefined, cycleRow: line, points: [] };
    if (columns.cycle >= 0 && cell(columns.cycle) !== '') {
      if (entry.cycle !== undefined && entry.cycle !== cycle) fail('cycle', cell(columns.cycle), `pathway "${name}" was marked ${entry.cycle ? 'yes' : 'no'} on line ${entry.cycleRow}`);
      else if (entry.cycle === undefined) { entry.cycle = cycle; entry.cycleRow = line; }
    }
    const isReference = columns.reference >= 0 ? readCycle(cell(columns.reference)) : false;
    if (isReference === undefined) { fail('reference', cell(columns.reference), 'expected yes or no'); continue; }
    if (isReference && estimate) { fail('reference', cell(columns.reference), 'the reference needs an energy; this row gives a rate constant or half-life'); continue; }
    if (isReference && referenceRow) { fail('reference', cell(columns.reference), `only one row can be the reference; line ${referenceRow.line} already is`); continue; }
    if (isReference) referenceRow = { line, pathway: name, index: entry.points.length };
    entry.points.push({ label: cell(columns.label), kind, value, estimate, sigma });
    pathways.set(name, entry);
  }
  if (errors.length > 0) return { ok: false, errors };
  if (pathways.size === 0) return { ok: false, errors: [{ row: header.line, column: '', value: '', message: 'the table has a header but no rows' }] };
  const absolute = columns.unit === 'hartree';
  const list = [...pathways];
  const refIndex = referenceRow ? list.findIndex(([name]) => name === referenceRow!.pathway) : -1;
  // Absolute values need a zero of their own: the reference row, else the table's first row.
  const firstValue = list.flatMap(([, entry]) => entry.points).find((p) => p.value !== undefined)?.value;
  const base = absolute ? ((referenceRow ? list[refIndex]![1].points[referenceRow.index]!.value : undefined) ?? firstValue ?? 0) : 0;
  const reference = referenceRow ? { kind: 'point' as const, pathway: `pathway-${refIndex + 1}`, point: `p${referenceRow.index + 1}` } : { kind: 'zero' as const };
  const doc = makeDocument({
    title,
    settings: { quantity: columns.quantity, unit: absolute ? 'kcal/mol' : columns.unit, reference },
    pathways: list.map(([name, entry], i) => {
      return {
        id: `pathway-${i + 1}`, name, cycle: entry.cycle ?? false,
        points: entry.points.map((p, j) => {
          const energy: EnergySpec = p.estimate
            ? { mode: 'estimate', estimate: p.estimate }
            : { mode: 'value', value: p.value! - base, unit: columns.unit, quantity: columns.quantity, ...(p.sigma === undefined ? {} : { sigma: p.sigma }) };
          return { id: `p${j + 1}`, label: p.label, kind: p.kind, energy };
        }),
      };
    }),
  });
  return { ok: true, doc };
}
