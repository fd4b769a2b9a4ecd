import type { Table } from './tables.ts';

/**
 * CSV per RFC 4180: comma-separated, CRLF line ends, fields with a comma, quote or line
 * break quoted with doubled quotes; unknown values are empty. Text that a spreadsheet
 * would run as a formula (starting with = + - @, tab or CR) gets a leading apostrophe
 * (OWASP "CSV injection" advice); numbers are written as numbers.
 */
export function tableToCsv(table: Table): string {
  const lines = [table.columns, ...table.rows].map((row) => row.map(cell).join(','));
  return `${lines.join('\r\n')}\r\n`;
}

function cell(value: string | number | null): string {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}
