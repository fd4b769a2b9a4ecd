import { dsvFormat } from 'd3';

/** Text rows of a spreadsheet paste, with the delimiter that was detected. */
export interface DelimitedRows {
  delimiter: ',' | ';' | '\t';
  /** Each row with its 1-based line number in the text (for messages). */
  rows: { line: number; cells: string[] }[];
}

/** Picks the delimiter from the header line: tab, then semicolon, then comma. */
function detectDelimiter(headerLine: string): DelimitedRows['delimiter'] {
  if (headerLine.includes('\t')) return '\t';
  if (headerLine.includes(';') && !headerLine.includes(',')) return ';';
  return ',';
}

/**
 * Splits CSV/TSV/semicolon text into rows with d3-dsv (RFC 4180 quoting), dropping a BOM,
 * Windows line ends and blank lines while keeping each row's line number.
 */
export function readDelimited(text: string): DelimitedRows {
  const clean = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  // The first line that holds any delimiter decides (a one-column first row says nothing).
  const lines = clean.split('\n').filter((l) => l.trim() !== '');
  const delimiter = detectDelimiter(lines.find((l) => /[\t;,]/.test(l)) ?? '');
  const parsed = dsvFormat(delimiter).parseRows(clean);
  // d3-dsv does not report line numbers; count newlines inside quoted cells to keep them.
  const rows: DelimitedRows['rows'] = [];
  let line = 1;
  for (const cells of parsed) {
    const span = cells.reduce((n, c) => n + (c.match(/\n/g)?.length ?? 0), 0);
    if (cells.some((c) => c.trim() !== '')) rows.push({ line, cells: cells.map((c) => c.trim()) });
    line += 1 + span;
  }
  return { delimiter, rows };
}

/** Reads a number as a person types it in a sheet: decimal point, Unicode minus, and a decimal comma when the delimiter is not a comma. */
export function readNumber(cell: string, delimiter: DelimitedRows['delimiter']): number | undefined {
  let s = cell.trim().replace(/^\u2212/, '-').replace(/^\+/, '');
  if (delimiter !== ',' && /^-?\d*,\d+$/.test(s)) s = s.replace(',', '.');
  if (!/^-?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(s)) return undefined;
  const value = Number(s);
  return Number.isFinite(value) ? value : undefined;
}
