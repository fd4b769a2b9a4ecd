import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../../../core/model/load.ts';
import { analysisReport } from '../../../../core/report/analysisReport.ts';
import { annotateReport } from '../../../../core/uncertainty/annotateReport.ts';
import { analyseUncertainty } from '../../../../core/uncertainty/uncertaintyRun.ts';
import { pathwayUncertaintyRows, rowInterval } from '../../../../ui/analysis/uncertaintyRows.ts';
import { typed } from '../../profile/builders.ts';

// Two-sided 95 % quantile of the standard normal (Abramowitz & Stegun, Table 26.5, from memory).
const Z975 = 1.959963985;
const withSigma = (id: string, kind: 'min' | 'ts', kcal: number, sigma: number) => typed(id, kind, kcal, { energy: { mode: 'value', value: kcal, unit: 'kcal/mol', sigma } });

describe('uncertainty panel rows: every number the analysis panel shows for a pathway', () => {
  // Invented: a two-step cycle, every point but the start with σ 1 kcal/mol.
  const doc = makeDocument({ pathways: [{ id: 'c', name: 'c', cycle: true, points: [typed('C1', 'min', 0), withSigma('T1', 'ts', 14, 1), withSigma('C2', 'min', -4, 1), withSigma('T2', 'ts', 12, 1), withSigma('C1′', 'min', -6, 1)] }] });
  const report = annotateReport(analysisReport(doc, analyseDocument(doc)), analyseUncertainty(doc, { samples: 20_000, seed: 4 }));
  const rows = pathwayUncertaintyRows(report, report.pathways[0]!, 'kcal mol⁻¹');

  it('lists the summary, span and step-table numbers, each with an interval', () => {
    expect(rows.map((r) => r.label)).toEqual([
      'Effective barrier / kcal mol⁻¹', 'Half-life it implies / s', 'Overall ΔrG / kcal mol⁻¹',
      'Energetic span δE / kcal mol⁻¹', 'TOF / s⁻¹', 'TOF, δE approximation / s⁻¹',
      ...Object.entries(report.pathways[0]!.energeticSpan!.degreeOfTofControl).filter(([, x]) => x >= 0.005).map(([k]) => `X_TOF ${k}`),
      ...['C1 → C2', 'C2 → C1′'].flatMap((n) => [`ΔG‡ fwd ${n} / kcal mol⁻¹`, `ΔG‡ rev ${n} / kcal mol⁻¹`, `ΔrG ${n} / kcal mol⁻¹`, `k ${n} / s⁻¹`, `k₋ ${n} / s⁻¹`, `K ${n}`, `t½ ${n} / s`]),
    ]);
    expect(rows.filter((r) => r.label.startsWith('X_TOF')).length).toBeGreaterThan(1);
    for (const r of rows) expect(rowInterval(r), r.label).not.toBeNull();
  });

  it('gives the overall ΔrG the end point\'s σ (C1 is the zero, C1′ is −6 ± 1): normal quantiles', () => {
    const overall = rows.find((r) => r.label.startsWith('Overall'))!;
    const i = rowInterval(overall)!;
    // s.e. of a 2.5 % sample quantile at N = 20 000 is ≈ 0.019 σ; allow 4 s.e.
    expect(Math.abs(i.low - (-6 - Z975))).toBeLessThan(0.08);
    expect(Math.abs(i.high - (-6 + Z975))).toBeLessThan(0.08);
  });
});
