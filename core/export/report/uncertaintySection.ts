import { analysisSpecs } from '../analysisTables.ts';
import { intervalRows, type IntervalRow } from '../columnSpec.ts';
import { MIN_SHARE, probabilityRows } from '../uncertaintyTables.ts';
import type { UncertainReport } from '../../uncertainty/annotateReport.ts';
import { sigmaText, uncertaintyStatement } from '../../uncertainty/uncertaintyStatement.ts';
import { reportCell } from './reportCell.ts';
import { intervalOf, type Holder } from '../../uncertainty/reportReaders.ts';
import type { ReportPages } from './reportPages.ts';

const SUBSECTIONS = [
  ['points', 'Energies'],
  ['steps', 'Steps'],
  ['effectiveBarriers', 'Effective barriers'],
  ['energeticSpans', 'Energetic span'],
  ['tofControl', 'Degree of TOF control'],
  ['comparisons', 'Comparisons'],
] as const;

const percent = (p: number) => `${(100 * p).toFixed(1)}\u00a0%`;

/** What the figure's error bars show, for the line under the figure. */
export function errorBarCaption(report: UncertainReport, mode: 'sigma' | 'interval'): string {
  const u = report.uncertainty;
  const what = mode === 'sigma' ? '± one standard deviation' : 'the 95 % interval (2.5th–97.5th percentiles)';
  return `Error bars: ${what} of each level over N = ${u.samples} Monte Carlo samples, seed ${u.seed}; the inputs' σ are listed under Uncertainty.`;
}

/** Each product's share of each selectivity comparison, in %. */
function shareRows(report: UncertainReport): IntervalRow[] {
  return report.comparisons.flatMap((c) => (c.type === 'rate' ? [] : c.products.flatMap((p) => {
    const i = intervalOf(p as Holder, 'percent');
    const r = (x: number) => Number(x.toFixed(1));
    return i ? [{ subject: `selectivity ${c.pathways.join(', ')}`, quantity: `share of ${p.pathway}`, unit: '%', estimate: r(p.percent), median: r(i.median), low: r(i.low), high: r(i.high) }] : [];
  })));
}

/**
 * The report's uncertainty section: how the run was made (N, seed, the interval), each
 * input's σ as entered, the median and 95 % interval of every quantity that varies (in the
 * tables' units and rounding), the probabilities of the TDTS, TDI, faster pathway and major
 * product, and the variance shares of the rate.
 */
export function uncertaintySection(pages: ReportPages, report: UncertainReport, decimals: number): void {
  const u = report.uncertainty;
  const stated = uncertaintyStatement(u);
  pages.heading('Uncertainty');
  pages.paragraph(`${stated.run[0]!.toUpperCase()}${stated.run.slice(1)}.`);
  pages.paragraph('Each input below was drawn independently from a normal distribution with its σ as entered, and every sample was run through the same resolution and analysis as the numbers above (propagation of distributions by Monte Carlo, JCGM 101:2008, Supplement 1 to the GUM; citation from memory). Quantities that no σ reaches are left out; an ee is signed toward the estimate\'s major product, negative where the other enantiomer is favoured.', 0.9);
  if (u.inputs.length === 0) {
    pages.paragraph(stated.inputs);
    return;
  }
  pages.table(['input', 'σ as entered', 'σ from'], u.inputs.map((i) => [i.input, sigmaText(i), i.default ? 'document default' : 'typed with the input']));
  const specs = analysisSpecs(report, decimals);
  for (const [key, title] of SUBSECTIONS) {
    const rows = [...intervalRows(specs[key] as Parameters<typeof intervalRows>[0]) as IntervalRow[], ...(key === 'comparisons' ? shareRows(report) : [])].filter((r) => r.high !== r.low);
    if (rows.length === 0) continue;
    pages.heading(`${title}: median and 95 % interval`, 1.1);
    // No-break spaces keep "97.5 %" on one line in narrow columns.
    pages.table(['result', 'quantity', 'estimate', 'median', '2.5\u00a0%', '97.5\u00a0%', 'unit'],
      rows.map((r) => [r.subject, r.quantity, reportCell(r.estimate), reportCell(r.median), reportCell(r.low), reportCell(r.high), r.unit]));
  }
  const grouped = new Map<string, string[]>();
  for (const [subject, what, outcome, p] of probabilityRows(report)) {
    const k = `${subject}\u0000${what}`;
    grouped.set(k, [...(grouped.get(k) ?? []), `${outcome} ${percent(p)}`]);
  }
  if (grouped.size > 0) {
    pages.heading('Probabilities over the samples', 1.1);
    pages.table(['result', 'of', 'probability'], [...grouped].map(([k, list]) => [...(k.split('\u0000') as [string, string]), list.join(', ')]));
  }
  const shares = u.rateSensitivity.flatMap((s) => s.shares.filter((x) => x.share >= MIN_SHARE).map((x) => [s.pathway, s.target, x.input, percent(x.share)]));
  if (shares.length > 0) {
    pages.heading('Which inputs matter for the rate', 1.1);
    pages.paragraph(`Variance share of each input: the squared correlation of its sampled deviation with ln TOF (cycles) or the effective barrier (linear pathways); for independent inputs these add up to the share a linear model explains (Saltelli et al., Global Sensitivity Analysis: The Primer, Wiley 2008; citation from memory). Shares under ${percent(MIN_SHARE)} are left out.`, 0.9);
    pages.table(['pathway', 'of', 'input', 'variance share'], shares);
  }
}
