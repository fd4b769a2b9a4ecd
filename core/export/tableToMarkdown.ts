import type { Table } from './tables.ts';

/**
 * A GitHub-flavoured Markdown table: header, separator (numeric columns right-aligned),
 * one line per row; pipes and backslashes in cells escaped, line breaks turned into spaces,
 * unknown values shown as "—". Numbers use U+2212 for minus.
 */
export function tableToMarkdown(table: Table): string {
  const numeric = table.columns.map((_, c) => table.rows.length > 0 && table.rows.every((r) => r[c] === null || typeof r[c] === 'number'));
  const line = (cells: string[]) => `| ${cells.join(' | ')} |`;
  return [
    line(table.columns.map(escape)),
    line(numeric.map((n) => (n ? '---:' : '---'))),
    ...table.rows.map((row) => line(row.map(show))),
  ].join('\n') + '\n';
}

function show(value: string | number | null): string {
  if (value === null) return '—';
  if (typeof value === 'number') return String(value).replace('-', '\u2212');
  return escape(value);
}

function escape(text: string): string {
  return text.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/\r?\n|\r/g, ' ');
}
