import type { AnalysisTables } from './analysisTables.ts';
import type { Table } from './tables.ts';
import { tableToCsv } from './tableToCsv.ts';
import { tableToMarkdown } from './tableToMarkdown.ts';
import type { UncertaintyTables } from './uncertaintyTables.ts';

type Titled = [string, Table];

const TITLES: Record<Exclude<keyof AnalysisTables, 'uncertainty'>, string> = {
  points: 'Energies',
  steps: 'Steps',
  effectiveBarriers: 'Effective barriers',
  energeticSpans: 'Energetic span',
  tofControl: 'Degree of TOF control',
  comparisons: 'Comparisons',
};

const UNCERTAINTY_TITLES: Record<Exclude<keyof UncertaintyTables, 'statement'>, string> = {
  run: 'Uncertainty run',
  inputs: 'Input uncertainties (σ as entered)',
  probabilities: 'Probabilities over the samples',
  sensitivity: 'Which inputs matter for the rate (variance shares of 1 % and more)',
};

/** The tables in order: the run and its inputs first (so N, seed and σ are stated up front), the analysis, then the probabilities. */
function ordered(tables: AnalysisTables): Titled[] {
  const u = tables.uncertainty;
  const extra = (keys: (keyof typeof UNCERTAINTY_TITLES)[]): Titled[] => (u ? keys.map((k) => [UNCERTAINTY_TITLES[k], u[k]]) : []);
  const main = (Object.entries(TITLES) as [keyof typeof TITLES, string][]).map(([k, name]): Titled => [name, tables[k]]);
  return [...extra(['run', 'inputs']), ...main, ...extra(['probabilities', 'sensitivity'])].filter(([, t]) => t.rows.length > 0);
}

/**
 * All analysis tables in one Markdown text, each under a heading; empty tables are left out.
 * With a Monte Carlo run, a line under the title states N, the seed and every input σ.
 */
export function tablesToMarkdown(tables: AnalysisTables, title: string): string {
  const statement = tables.uncertainty?.statement;
  const parts = [`# ${title || 'Energy profile'}\n`];
  if (statement) parts.push(`Uncertainty: ${statement.run}. Input σ: ${statement.inputs}.\n`);
  for (const [name, table] of ordered(tables)) parts.push(`## ${name}\n\n${tableToMarkdown(table)}`);
  return parts.join('\n');
}

/** All analysis tables in one CSV text: a title row before each table, a blank line between them. */
export function tablesToCsv(tables: AnalysisTables): string {
  return ordered(tables).map(([name, table]) => `${name}\r\n${tableToCsv(table)}`).join('\r\n');
}
