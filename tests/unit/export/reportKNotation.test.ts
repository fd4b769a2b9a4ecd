import { describe, expect, it } from 'vitest';
import { reportContent } from '../../../core/export/report/reportContent.ts';
import type { ReportPages } from '../../../core/export/report/reportPages.ts';
import { formatTableNumber, roundSignificant } from '../../../core/format/tableNumber.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';
import { annotateReport } from '../../../core/uncertainty/annotateReport.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { typed } from '../profile/builders.ts';

/** Records every table the report writes, by the heading above it. */
function recordTables() {
  const tables = new Map<string, (readonly string[])[]>();
  let heading = '';
  const pages = {
    heading: (t: string) => { heading = t; },
    paragraph: () => {}, figure: () => {}, keepTogether: () => {},
    table: (_c: readonly string[], rows: readonly (readonly string[])[]) => { tables.set(heading, [...rows]); },
  };
  return { pages: pages as unknown as ReportPages, tables };
}

describe('report: one notation for k in the Steps table and the uncertainty tables', () => {
  it('rounds to the tables\' significant figures and switches to × 10ⁿ at the same bounds', () => {
    expect(formatTableNumber(roundSignificant(1.234567e-4)!)).toBe('1.235 × 10⁻⁴');
    expect(formatTableNumber(roundSignificant(0.0123456)!)).toBe('0.01235');
    expect(formatTableNumber(roundSignificant(6.2152e12)!)).toBe('6.215 × 10¹²');
    expect(formatTableNumber(roundSignificant(-12345.67)!)).toBe('−12350');
  });

  it('prints the same k forward in both tables', { timeout: 30_000 }, () => {
    // Invented: barriers 14.3 and 21.7 kcal/mol (σ 1) give k of order 10² and 10⁻³ s⁻¹ at 298.15 K.
    const doc = makeDocument({
      title: 'k notation',
      pathways: [{ id: 'a', name: 'A', points: [typed('R', 'min', 0), typed('TS1', 'ts', 14.3, { energy: { mode: 'barrier', value: 14.3, unit: 'kcal/mol', sigma: 1 } }), typed('I', 'min', -1), typed('TS2', 'ts', 21.7, { energy: { mode: 'barrier', value: 21.7, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -8)] }],
    });
    const analysis = analyseDocument(doc);
    const report = analysisReport(doc, analysis);
    const run = analyseUncertainty(doc, { samples: 500, seed: 1 });
    const { pages, tables } = recordTables();
    reportContent(pages, doc, analysis, report, { items: [] } as never, annotateReport(report, run));
    const steps = tables.get('Steps')!;
    const intervals = tables.get('Steps: median and 95 % interval')!;
    expect(steps).toHaveLength(2);
    for (const [i, step] of report.pathways[0]!.steps.entries()) {
      const stepsCell = steps[i]![5]!;
      const estimateCell = intervals.find((r) => r[0] === `${steps[i]![0]}: ${steps[i]![1]}` && r[1] === 'k forward')![2]!;
      expect(stepsCell).toBe(`${estimateCell} ${step.kForwardUnit}`);
      expect(estimateCell).toBe(formatTableNumber(roundSignificant(step.kForward)!));
    }
  });
});
