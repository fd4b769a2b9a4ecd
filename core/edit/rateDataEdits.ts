/** One measured rate constant at one temperature (as in an Eyring or Arrhenius estimate). */
export interface RateRow {
  temperatureK: number;
  k: number;
}

/** A change to a table of (T, k) rows. */
export type RateDataEdit =
  | { type: 'set'; index: number; temperatureK?: number; k?: number }
  | { type: 'add' }
  | { type: 'remove'; index: number };

/** Fewest rows a two-parameter fit (slope and intercept) can be made from. */
export const MIN_RATE_ROWS = 2;

// A new row continues the table 10 K above its warmest row with the last k (our choice:
// a common step in variable-temperature kinetics, easy to overtype).
const NEXT_ROW_STEP_K = 10;

/**
 * Applies an edit to the (T, k) rows of an Eyring-plot or Arrhenius estimate. Returns the
 * new rows, or a message naming the row and cell that cannot be accepted: T and k must
 * be positive finite numbers, and at least two rows must stay for the fit.
 */
export function editRateData(rows: readonly RateRow[], edit: RateDataEdit): RateRow[] | string {
  if (edit.type === 'add') {
    const last = rows.at(-1);
    const warmest = Math.max(0, ...rows.map((r) => r.temperatureK));
    return [...rows, { temperatureK: warmest > 0 ? warmest + NEXT_ROW_STEP_K : 298.15, k: last?.k ?? 1 }];
  }
  if (edit.index < 0 || edit.index >= rows.length) return `there is no row ${edit.index + 1}`;
  if (edit.type === 'remove') {
    if (rows.length <= MIN_RATE_ROWS) return `a fit needs at least ${MIN_RATE_ROWS} (T, k) rows; add one before removing row ${edit.index + 1}`;
    return rows.filter((_, i) => i !== edit.index);
  }
  const row = { ...rows[edit.index]!, ...(edit.temperatureK !== undefined ? { temperatureK: edit.temperatureK } : {}), ...(edit.k !== undefined ? { k: edit.k } : {}) };
  if (!Number.isFinite(row.temperatureK) || row.temperatureK <= 0) return `row ${edit.index + 1}, T: expected a positive temperature in K`;
  if (!Number.isFinite(row.k) || row.k <= 0) return `row ${edit.index + 1}, k: expected a positive rate constant in s⁻¹`;
  return rows.map((r, i) => (i === edit.index ? row : r));
}
