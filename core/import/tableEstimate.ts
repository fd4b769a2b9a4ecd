import { outsideHard } from '../model/bounds.ts';
import type { Estimate } from '../model/schema.ts';
import { readNumber, type DelimitedRows } from './delimited.ts';

/**
 * The optional rate columns of a table of points: a transition-state row may give its barrier
 * as a measured rate constant (`k`, with `molecularity` 1–3, default 1) or half-life
 * (`half-life [s]`) instead of an energy, each with its own σ column (`k sigma` in k's unit,
 * `half-life sigma [s]`; issue 18). σ is bounded relative to its value by `BOUNDS.relativeSigma`.
 */
export const RATE_COLUMNS = ['k', 'k sigma', 'molecularity', 'half-life [s]', 'half-life sigma [s]'] as const;
export type RateColumn = (typeof RATE_COLUMNS)[number];

/** Header cells that name a rate column with a unit other than seconds ("half-life [min]"). */
const TIME_HEADER = /^(half-life(?: sigma)?)\s*\[(.+)\]$/;

/** Why a header cell is a rate column in a wrong unit, or null. */
export function rateHeaderProblem(cell: string): string | null {
  const match = TIME_HEADER.exec(cell.toLowerCase());
  if (!match || match[2]!.trim() === 's') return null;
  return `unknown time unit "${match[2]}"; ${match[1]} is read in s, e.g. "${match[1]} [s]"`;
}

/** The rate column a header cell names ("Half-life [ s ]" → "half-life [s]"), or undefined. */
export function rateColumnOf(cell: string): RateColumn | undefined {
  const name = cell.toLowerCase().replace(/\s*\[\s*s\s*\]$/, ' [s]').replace(/\s+/g, ' ');
  return (RATE_COLUMNS as readonly string[]).includes(name) ? (name as RateColumn) : undefined;
}

type Fail = (column: RateColumn, value: string, message: string) => void;

function readPositive(text: string, column: RateColumn, bound: 'rateConstant' | 'timeSeconds', delimiter: DelimitedRows['delimiter'], fail: Fail): number | undefined {
  const value = readNumber(text, delimiter);
  const problem = value === undefined ? 'expected a number' : outsideHard(bound, value);
  if (problem) { fail(column, text, problem); return undefined; }
  return value;
}

function readRateSigma(text: string, column: RateColumn, value: number | undefined, unit: string, delimiter: DelimitedRows['delimiter'], fail: Fail): number | undefined | false {
  if (text === '') return undefined;
  const sigma = readNumber(text, delimiter);
  if (sigma === undefined || sigma < 0) { fail(column, text, `expected a standard uncertainty ≥ 0 ${unit}, or an empty cell`); return false; }
  if (value === undefined) return false;
  const problem = outsideHard('relativeSigma', sigma / value);
  if (problem) { fail(column, text, `σ ${sigma} with value ${value}: ${problem}`); return false; }
  return sigma;
}

/**
 * The estimate a row's rate cells give, `null` when the row has none, or `false` after
 * reporting its problems through `fail`. `cell` reads the row's cell of a rate column ('' when absent).
 */
export function readRateEstimate(cell: (column: RateColumn) => string, delimiter: DelimitedRows['delimiter'], fail: Fail): Estimate | null | false {
  const kText = cell('k');
  const halfText = cell('half-life [s]');
  const orphan = (sigma: RateColumn, value: RateColumn) => {
    if (cell(sigma) !== '' && cell(value) === '') fail(sigma, cell(sigma), `a σ needs its value in the "${value}" column of the same row`);
  };
  orphan('k sigma', 'k');
  orphan('half-life sigma [s]', 'half-life [s]');
  if (cell('molecularity') !== '' && kText === '') fail('molecularity', cell('molecularity'), 'a molecularity needs a rate constant in the "k" column of the same row');
  if (kText === '' && halfText === '') return cell('k sigma') || cell('half-life sigma [s]') || cell('molecularity') ? false : null;
  if (kText !== '' && halfText !== '') { fail('half-life [s]', halfText, 'give either a rate constant "k" or a half-life on one row, not both'); return false; }
  if (kText !== '') {
    const k = readPositive(kText, 'k', 'rateConstant', delimiter, fail);
    const kSigma = readRateSigma(cell('k sigma'), 'k sigma', k, 'in the unit of k', delimiter, fail);
    const molecularityText = cell('molecularity');
    const molecularity = molecularityText === '' ? 1 : Number(molecularityText);
    const badOrder = ![1, 2, 3].includes(molecularity);
    if (badOrder) fail('molecularity', molecularityText, 'expected 1, 2 or 3, or an empty cell (1)');
    if (k === undefined || kSigma === false || badOrder) return false;
    return { method: 'rateConstant', k, molecularity, ...(kSigma === undefined ? {} : { kSigma }) };
  }
  const seconds = readPositive(halfText, 'half-life [s]', 'timeSeconds', delimiter, fail);
  const secondsSigma = readRateSigma(cell('half-life sigma [s]'), 'half-life sigma [s]', seconds, 'in s', delimiter, fail);
  if (seconds === undefined || secondsSigma === false) return false;
  return { method: 'halfLife', seconds, ...(secondsSigma === undefined ? {} : { secondsSigma }) };
}
