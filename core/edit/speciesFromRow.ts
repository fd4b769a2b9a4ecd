import { Species, type Structure } from '../model/schema.ts';
import { readNumber } from '../import/delimited.ts';
import { SPECIES_COLUMNS, type SpeciesColumnKey, type SpeciesRow } from './speciesColumns.ts';
import { sigmaProblem } from './sigmaProblem.ts';

/** A bad cell: which column and why (the row is added by the caller). */
export interface CellProblem {
  column: SpeciesColumnKey;
  value: string;
  message: string;
}

const PHASES = ['solute', 'solvent', 'liquid', 'gas', 'none'] as const;

/** The usual state symbols g, l, s, aq (IUPAC Green Book, from memory) as phases; a solid gets no standard-state change. */
const PHASE_SYMBOLS: Record<string, (typeof PHASES)[number]> = { g: 'gas', l: 'liquid', aq: 'solute', s: 'none', solid: 'none', sln: 'solute' };

/**
 * Builds a species from sheet cells, keeping what the cells do not show (further
 * conformers, neat concentration, correction temperature) from `base`. Every bad cell is
 * reported; a species comes back only when there are none.
 */
export function speciesFromRow(row: SpeciesRow, base: Species | undefined): { species: Species | null; problems: CellProblem[] } {
  const problems: CellProblem[] = [];
  const numbers: Partial<Record<SpeciesColumnKey, number>> = {};
  for (const column of SPECIES_COLUMNS) {
    const cell = row[column.key].trim();
    if (!column.numeric || cell === '') continue;
    const value = readNumber(cell, '\t');
    const refused = value === undefined ? `expected a number${column.unit ? ` in ${column.unit}` : ''}`
      : column.sigmaOf ? sigmaProblem(value, column.unit === 'Eh' ? 'hartree' : 'kJ/mol') : null;
    if (refused !== null) problems.push({ column: column.key, value: cell, message: refused });
    else numbers[column.key] = value;
  }
  const id = row.id.trim();
  if (id === '') problems.push({ column: 'id', value: '', message: 'expected a non-empty id' });
  const typedPhase = row.phase.trim().replace(/^\((.*)\)$/, '$1').toLowerCase() || 'solute';
  const phase = PHASE_SYMBOLS[typedPhase] ?? typedPhase;
  if (!(PHASES as readonly string[]).includes(phase)) problems.push({ column: 'phase', value: row.phase.trim(), message: `expected one of ${PHASES.join(', ')} (or g, l, s, aq)` });
  const hasStructure = ['singlePoint', 'hCorrection', 'gCorrection', 'sigma', 'correctionSigma'].some((k) => row[k as SpeciesColumnKey].trim() !== '');
  if (numbers.electronic === undefined && hasStructure && row.electronic.trim() === '') {
    problems.push({ column: 'electronic', value: '', message: 'expected the electronic energy (Eh) when a single point, a correction or a σ is given' });
  }
  if (problems.length > 0) return { species: null, problems };

  const structures: Structure[] = base?.structures.slice(1) ?? [];
  if (numbers.electronic !== undefined) {
    const first: Structure = { ...(base?.structures[0]?.label ? { label: base.structures[0].label } : {}), electronic: numbers.electronic };
    if (numbers.singlePoint !== undefined) first.singlePoint = numbers.singlePoint;
    if (numbers.hCorrection !== undefined) first.hCorrection = numbers.hCorrection;
    if (numbers.gCorrection !== undefined) first.gCorrection = numbers.gCorrection;
    if (numbers.sigma !== undefined) first.sigma = numbers.sigma;
    if (numbers.correctionSigma !== undefined) first.correctionSigma = numbers.correctionSigma;
    structures.unshift(first);
  }
  const formation = Object.fromEntries((['dfH', 'S', 'dfG', 'dfHSigma', 'dfGSigma'] as const).flatMap((k) => (numbers[k] === undefined ? [] : [[k, numbers[k]]])));
  const candidate = {
    ...(base ?? {}),
    id, label: row.label, phase, structures,
    formula: row.formula.trim() || undefined,
    charge: numbers.charge,
    formation: Object.keys(formation).length > 0 ? formation : undefined,
  };
  for (const key of Object.keys(candidate) as (keyof typeof candidate)[]) if (candidate[key] === undefined) delete candidate[key];
  const parsed = Species.safeParse(candidate);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    return { species: null, problems: [{ column: 'id', value: id, message: `${issue.path.join('.')}: ${issue.message}` }] };
  }
  return { species: parsed.data, problems: [] };
}
