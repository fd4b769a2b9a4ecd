import type { AnalysisTables } from './analysisTables.ts';
import { tableToCsv } from './tableToCsv.ts';
import { tableToMarkdown } from './tableToMarkdown.ts';

const TITLES: Record<keyof AnalysisTables, string> = {
  points: 'Energies',
  steps: 'Steps',
  effectiveBarriers: 'Effective barriers',
  energeticSpans: 'Energetic span',
  comparisons: 'Comparisons',
};

/** All analysis tables in one Markdown text, each under a heading; empty tables are left out. */
export function tablesToMarkdown(tables: AnalysisTables, title: string): string {
  const parts = [`# ${title || 'Energy profile'}\n`];
  for (const [key, name] of Object.entries(TITLES) as [keyof AnalysisTables, string][]) {
    if (tables[key].rows.length > 0) parts.push(`## ${name}\n\n${tableToMarkdown(tables[key])}`);
  }
  return parts.join('\n');
}

/** All analysis tables in one CSV text: a title row before each table, a blank line between them. */
export function tablesToCsv(tables: AnalysisTables): string {
  return (Object.entries(TITLES) as [keyof AnalysisTables, string][])
    .filter(([key]) => tables[key].rows.length > 0)
    .map(([key, name]) => `${name}\r\n${tableToCsv(tables[key])}`)
    .join('\r\n');
}
