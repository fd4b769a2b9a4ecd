import { readDelimited } from '../import/delimited.ts';

/** A pasted cell that has no column to go to (index in the block's rows, 0-based column). */
export interface StrayCell {
  row: number;
  column: number;
  value: string;
  /** Whether the block had a header line (the cell lies past it) or not (past the sheet's last column). */
  headed: boolean;
}

/**
 * Reads a tab-separated block pasted into a sheet with the given columns. A first line
 * whose cells all name columns is a header that decides where each column goes; otherwise
 * every row fills from `start` rightwards, however wide the first row is. Returns the
 * cells of each body row by column key, and every non-empty cell that has no column.
 */
export function pastedBlock<C extends { key: string }>(text: string, columns: readonly C[], byName: (name: string) => C | undefined, start: C['key']): { rows: Partial<Record<C['key'], string>>[]; stray: StrayCell[] } {
  const { rows } = readDelimited(text);
  if (rows.length === 0) return { rows: [], stray: [] };
  const header = rows[0]!.cells.map(byName);
  const headed = header.every((c) => c !== undefined);
  const first = columns.findIndex((c) => c.key === start);
  const columnAt = (k: number) => (headed ? header[k] : columns[first + k]);
  const stray: StrayCell[] = [];
  const body = (headed ? rows.slice(1) : rows).map((r, i) => {
    const out: Partial<Record<C['key'], string>> = {};
    r.cells.forEach((cell, k) => {
      const column = columnAt(k);
      if (column) out[column.key as C['key']] = cell;
      else if (cell !== '') stray.push({ row: i, column: k, value: cell, headed });
    });
    return out;
  });
  return { rows: body, stray };
}
