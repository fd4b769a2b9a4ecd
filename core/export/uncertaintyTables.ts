import type { UncertainReport } from '../uncertainty/annotateReport.ts';
import { probabilitiesOf, type Holder } from '../uncertainty/reportReaders.ts';
import { uncertaintyStatement } from '../uncertainty/uncertaintyStatement.ts';
import { sigmaUnitLabel } from '../uncertainty/uncertainInputs.ts';
import type { Table } from './tables.ts';

/** The tables a Monte Carlo run adds to the analysis tables. */
export interface UncertaintyTables {
  /** N, the seed, the method and what the interval is (one row). */
  run: Table;
  /** Each input's σ as entered, its unit, and whether it is typed or the document default. */
  inputs: Table;
  /** TDTS and TDI of each cycle, the faster pathway of each rate comparison, the major product of each selectivity. */
  probabilities: Table;
  /** Variance shares of ln TOF (cycles) or the effective barrier (linear pathways) of `MIN_SHARE` and more, largest first. */
  sensitivity: Table;
  /** The run and its input σ as two sentences (`uncertaintyStatement`), for text outputs. */
  statement: { run: string; inputs: string };
}

/** Shares below this are left out: with N samples an input that does not matter still shows r² of order 1/N. */
export const MIN_SHARE = 0.01;

const percent = (p: number) => Number((100 * p).toFixed(1));

/** One row per outcome: what is uncertain, which result, the outcome and its probability. */
export function probabilityRows(report: UncertainReport): [string, string, string, number][] {
  const rows: [string, string, string, number][] = [];
  const add = (subject: string, what: string, holder: Holder | null, field: string) => {
    for (const [outcome, p] of probabilitiesOf(holder, field)) rows.push([subject, what, outcome, p]);
  };
  for (const p of report.pathways) {
    add(p.name, 'TDTS', p.energeticSpan, 'tdts');
    add(p.name, 'TDI', p.energeticSpan, 'tdi');
  }
  for (const c of report.comparisons) {
    if (c.type === 'rate') add(`${c.candidate} vs ${c.baseline}`, 'faster pathway', c, 'faster');
    else add(`selectivity ${c.pathways.join(', ')}`, 'major product', c, 'major');
  }
  return rows;
}

/** The run's own tables, from a report annotated by `annotateReport`. */
export function uncertaintyTables(report: UncertainReport): UncertaintyTables {
  const u = report.uncertainty;
  return {
    run: { columns: ['samples N', 'seed', 'method', 'interval'], rows: [[u.samples, u.seed, u.method, u.interval]] },
    inputs: {
      columns: ['input', 'σ (unit in next column)', 'σ unit', 'σ from'],
      rows: u.inputs.map((i) => [i.input, i.sigma, sigmaUnitLabel(i.unit), i.default ? 'document default (settings.uncertainty.defaultSigma)' : 'typed with the input']),
    },
    probabilities: {
      columns: ['pathway or comparison', 'result', 'outcome', 'probability / %'],
      rows: probabilityRows(report).map(([s, w, o, p]) => [s, w, o, percent(p)]),
    },
    statement: uncertaintyStatement(u),
    sensitivity: {
      columns: ['pathway', 'of', 'input', 'variance share / %'],
      rows: u.rateSensitivity.flatMap((s) => s.shares.filter((x) => x.share >= MIN_SHARE).map((x) => [s.pathway, s.target, x.input, percent(x.share)])),
    },
  };
}
