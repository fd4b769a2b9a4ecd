import type { ReportInterval } from '../uncertainty/annotateReport.ts';
import { entryIntervalOf, intervalOf, type Holder } from '../uncertainty/reportReaders.ts';
import type { Table } from './tables.ts';

type Cell = Table['rows'][number][number];

/** Where a column's Monte Carlo interval sits in an annotated report, and how it is shown. */
export interface IntervalSpec<R> {
  /** The quantity's name without its unit, e.g. "ΔG‡ forward". */
  name: string;
  /** Unit for headers (" / kcal mol⁻¹" form); null when it varies by row (see `rowUnit`). */
  unit: string | null;
  /** Header note where the unit varies by row, e.g. "unit in k forward unit". */
  unitNote?: string;
  /** The row's own unit, for rows listed one quantity per line. */
  rowUnit?: (row: R) => string;
  holder: (row: R) => object | null;
  field: string | ((row: R) => string);
  /** For a number inside a keyed table (a cycle's X_TOF): the row's key there. */
  entry?: (row: R) => string;
  /** The point estimate when the interval is attached to another column (k beside its unit). */
  estimate?: (row: R) => Cell;
  /** Rounds (or rescales) a value for display, as the column's point estimate is. */
  show: (x: number) => number;
}

/** One column of an analysis table: its header, its cell, and optionally its interval. */
export interface ColumnSpec<R> {
  title: string;
  cell: (row: R) => Cell;
  interval?: IntervalSpec<R>;
  /** Shown only beside Monte Carlo results (e.g. P(faster)). */
  uncertainOnly?: boolean;
}

/** A table as specs: rows, columns, and how to name a row when quantities are listed one per line. */
export interface TableSpec<R> {
  rows: R[];
  columns: ColumnSpec<R>[];
  subject: (row: R) => string;
}

const PARTS = [['median', 'median'], ['2.5 %', 'low'], ['97.5 %', 'high']] as const;

function header(spec: IntervalSpec<unknown>, part: string): string {
  if (spec.unit) return `${spec.name}, ${part} / ${spec.unit}`;
  return spec.unitNote ? `${spec.name}, ${part} (${spec.unitNote})` : `${spec.name}, ${part}`;
}

/** The interval of a spec's quantity in a row, or null. */
export function intervalAt<R>(spec: IntervalSpec<R>, row: R): ReportInterval | null {
  const holder = spec.holder(row) as Holder | null;
  const field = typeof spec.field === 'string' ? spec.field : spec.field(row);
  return spec.entry ? entryIntervalOf(holder, field, spec.entry(row)) : intervalOf(holder, field);
}

/**
 * The table of `spec`; with `intervals`, each column that has one is followed by its median,
 * 2.5 % and 97.5 % columns (same unit and rounding), and uncertain-only columns are added.
 */
export function buildTable<R>(spec: TableSpec<R>, intervals: boolean): Table {
  const columns: string[] = [];
  const cells: ((row: R) => Cell)[] = [];
  for (const c of spec.columns) {
    if (c.uncertainOnly && !intervals) continue;
    columns.push(c.title);
    cells.push(c.cell);
    const iv = c.interval;
    if (!intervals || !iv) continue;
    for (const [part, key] of PARTS) {
      columns.push(header(iv as IntervalSpec<unknown>, part));
      cells.push((row) => { const i = intervalAt(iv, row); return i ? iv.show(i[key]) : null; });
    }
  }
  return { columns, rows: spec.rows.map((r) => cells.map((f) => f(r))) };
}

/** One quantity with its point estimate and interval, rounded as its table shows it. */
export interface IntervalRow {
  subject: string;
  quantity: string;
  unit: string;
  estimate: Cell;
  median: number;
  low: number;
  high: number;
}

/** Every interval of a table, one quantity per row (the report lists them so). */
export function intervalRows<R>(spec: TableSpec<R>): IntervalRow[] {
  const out: IntervalRow[] = [];
  for (const row of spec.rows) {
    for (const c of spec.columns) {
      const iv = c.interval;
      const i = iv && intervalAt(iv, row);
      if (!iv || !i) continue;
      out.push({ subject: spec.subject(row), quantity: iv.name, unit: iv.unit ?? iv.rowUnit?.(row) ?? '', estimate: iv.estimate ? iv.estimate(row) : c.cell(row), median: iv.show(i.median), low: iv.show(i.low), high: iv.show(i.high) });
    }
  }
  return out;
}
