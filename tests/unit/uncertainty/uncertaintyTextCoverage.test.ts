import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';
import { annotateReport } from '../../../core/uncertainty/annotateReport.ts';
import { uncertaintyText } from '../../../core/uncertainty/uncertaintyText.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { typed } from '../profile/builders.ts';

const withSigma = (id: string, kind: 'min' | 'ts', kcal: number, sigma: number) => typed(id, kind, kcal, { energy: { mode: 'value', value: kcal, unit: 'kcal/mol', sigma } });
/** "median [low, high]": a number printed with its interval (a "—" would not match). */
const moved = /(−|-)?\d[\d.e+-]* \[(−|-)?\d[\d.e+-]*, (−|-)?\d[\d.e+-]*\]/.source;

describe('analyze --uncertainty text: every number the analysis text shows has its interval', () => {
  // Invented: a linear pathway with a TS below the next minimum, a two-step cycle, and two competing channels.
  const doc = makeDocument({
    pathways: [
      { id: 'lin', name: 'lin', points: [typed('R', 'min', 0), withSigma('TS1', 'ts', 19, 1), typed('I', 'min', 1), typed('TS2', 'ts', 3), withSigma('P', 'min', 5, 1)] },
      { id: 'cyc', name: 'cyc', cycle: true, points: [typed('C1', 'min', 0), withSigma('T1', 'ts', 14, 1), withSigma('C2', 'min', -4, 1), withSigma('T2', 'ts', 12, 1), typed('C1′', 'min', -6)] },
      { id: 'x', name: 'x', points: [typed('S', 'min', 0), withSigma('TSx', 'ts', 15, 1), typed('Px', 'min', -9)] },
      { id: 'y', name: 'y', points: [typed('S', 'min', 0), withSigma('TSy', 'ts', 16, 1), typed('Py', 'min', -9)] },
    ],
    comparisons: [{ type: 'rate', baseline: 'x', candidate: 'y' }, { type: 'selectivity', pathways: ['x', 'y'], enantiomeric: true }],
  });
  const report = analysisReport(doc, analyseDocument(doc));
  const text = uncertaintyText(annotateReport(report, analyseUncertainty(doc, { samples: 2000, seed: 5 })));

  it('prints both barriers, Δ, k, k₋, K and t½ of a step, and the barrier k uses where the TS was raised', () => {
    expect(text).toMatch(new RegExp(`step R → TS1 → I: ΔG‡ ${moved} / ${moved} back, Δ ${moved} kcal mol⁻¹; k ${moved} s⁻¹, k₋ ${moved} s⁻¹; K ${moved}; t½ ${moved} s`));
    expect(text).toMatch(new RegExp(`step I → TS2 → P: ΔG‡ .* back \\(k uses ${moved}\\)`));
  });

  it('prints the overall reaction energy, the effective barrier\'s t½, and every energetic-span number', () => {
    expect(text).toMatch(new RegExp(`overall ΔG ${moved} kcal mol⁻¹`));
    expect(text).toMatch(new RegExp(`effective barrier ${moved} kcal mol⁻¹, t½ ${moved} s`));
    expect(text).toMatch(new RegExp(`TOF ${moved} s⁻¹ \\(δE approximation ${moved} s⁻¹\\); apparent barrier ${moved} kcal mol⁻¹; ΔGr per turnover ${moved} kcal mol⁻¹`));
  });

  it('prints the selectivity ratio, its ΔΔG‡ and each channel\'s effective TS', () => {
    expect(text).toMatch(new RegExp(`x ${moved} % \\(effective TS ${moved} kcal mol⁻¹\\)`));
    expect(text).toMatch(new RegExp(`x : y = ${moved}, ΔΔG‡ ${moved} kcal mol⁻¹`));
  });

  it('leaves no "—" where the analysis has a number', () => {
    expect(text).not.toContain('—');
  });
});
