import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import { analyseUncertainty, type UncertaintyResult } from '../../../core/uncertainty/uncertaintyRun.ts';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';
import { annotateReport } from '../../../core/uncertainty/annotateReport.ts';
import { entryIntervalOf } from '../../../core/uncertainty/reportReaders.ts';
import { uncertaintyText } from '../../../core/uncertainty/uncertaintyText.ts';
import { onePathway, typed } from '../profile/builders.ts';

// Two-sided 95 % quantile of the standard normal, z₀.₉₇₅ = 1.959963985 (Abramowitz & Stegun, Table 26.5, from memory).
const Z975 = 1.959963985;
const N = 40_000;
// s.e. of a 2.5 % sample quantile of N normals: √(p(1−p)/N)/φ(z) ≈ 0.013 σ at N = 40 000; allow 4 s.e. (per 1 kcal/mol of σ).
const TOL = 4 * Math.sqrt(0.025 * 0.975 / N) / 0.05844;

const valueWithSigma = (id: string, kind: 'min' | 'ts', kcal: number, sigma: number) => typed(id, kind, kcal, { energy: { mode: 'value', value: kcal, unit: 'kcal/mol', sigma } });
/** An interval in kcal/mol (energies are stored in J/mol; 1 kcal = 4184 J, NIST SP 811). */
function kcal(result: UncertaintyResult, key: string) {
  const q = result.quantities.find((x) => x.key === key);
  if (!q?.interval) throw new Error(`no interval for ${key}`);
  return { point: q.point! / 4184, median: q.interval.median / 4184, low: q.interval.low / 4184, high: q.interval.high / 4184 };
}

describe('uncertainty: numbers the outputs show that had no interval before', () => {
  it('overall ΔrG of a pathway: its end points\' σ add in quadrature (GUM JCGM 100:2008 §5.1, from memory)', () => {
    // Invented: R 0 ± 0.8, TS 18, P −7 ± 0.6 kcal/mol on the document-wide zero: Δr = P − R, σ = √(0.8² + 0.6²) = 1.0.
    const doc = onePathway([valueWithSigma('R', 'min', 0, 0.8), typed('TS', 'ts', 18), valueWithSigma('P', 'min', -7, 0.6)]);
    const r = kcal(analyseUncertainty(doc, { samples: N, seed: 11 }), 'a/reactionEnergy');
    expect(r.point).toBeCloseTo(-7, 9);
    expect(Math.abs(r.low - (-7 - Z975))).toBeLessThan(TOL);
    expect(Math.abs(r.high - (-7 + Z975))).toBeLessThan(TOL);
  });

  it('the barrier k uses follows ΔG‡ forward, and the higher minimum where the TS lies below it', () => {
    // Invented: a normal step (TS 20 ± 1 above R) and a step whose TS (3) lies below the next minimum (5 ± 1).
    const doc = onePathway([typed('R', 'min', 0), valueWithSigma('TS1', 'ts', 20, 1), typed('I', 'min', 0), typed('TS2', 'ts', 3), valueWithSigma('P', 'min', 5, 1)]);
    const run = analyseUncertainty(doc, { samples: N, seed: 12 });
    const normal = kcal(run, 'a/step 0/barrierUsed');
    expect(normal).toEqual(kcal(run, 'a/step 0/barrierForward'));
    expect(Math.abs(normal.high - (20 + Z975))).toBeLessThan(TOL);
    const raised = kcal(run, 'a/step 1/barrierUsed');
    // Raised to P: max(3, 0, 5 + ε) is 5 + ε above its 2.3 % point (ε < −2 σ), so the median and 97.5 % point are P's.
    expect(raised.point).toBeCloseTo(5, 9);
    expect(Math.abs(raised.median - 5)).toBeLessThan(TOL);
    expect(Math.abs(raised.high - (5 + Z975))).toBeLessThan(TOL);
    expect(raised.low).toBeGreaterThanOrEqual(3);
  });

  it('each selectivity channel\'s effective TS energy carries its TS\'s σ (normal quantiles)', () => {
    // Invented: two channels from one start, TS 15 ± 1 and 16.2 ± 0.5 kcal/mol.
    const pathway = (id: string, ts: number, sigma: number) => ({ id, name: id, points: [typed('R', 'min', 0), valueWithSigma('TS', 'ts', ts, sigma), typed('P', 'min', -10)] });
    const doc = makeDocument({ pathways: [pathway('X', 15, 1), pathway('Y', 16.2, 0.5)], comparisons: [{ type: 'selectivity', pathways: ['X', 'Y'] }] });
    const run = analyseUncertainty(doc, { samples: N, seed: 13 });
    const x = kcal(run, 'comparison 0/X/effectiveTs');
    const y = kcal(run, 'comparison 0/Y/effectiveTs');
    expect(x.point).toBeCloseTo(15, 9);
    expect(Math.abs(x.low - (15 - Z975))).toBeLessThan(TOL);
    expect(Math.abs(y.high - (16.2 + 0.5 * Z975))).toBeLessThan(TOL * 0.5);
  });

  it('a cycle\'s degree of TOF control: percentiles are X_TOF at T2₀ ∓ 1.959964 σ (one input, X_TOF monotone in it)', () => {
    // Invented cycle; only T2 (12 kcal/mol) carries σ 1. Quantiles commute with a monotone map, so the
    // 2.5/97.5 % points of X_TOF(T2) are the point analysis at T2 = 12 ∓ z σ (normal quantiles); bracket z by 4 s.e.
    const cycle = (t2: number, sigma?: number) => makeDocument({ pathways: [{ id: 'c', name: 'c', cycle: true, points: [typed('C1', 'min', 0), typed('T1', 'ts', 13), typed('C2', 'min', -3), sigma ? valueWithSigma('T2', 'ts', t2, sigma) : typed('T2', 'ts', t2), typed('C1′', 'min', -6)] }] });
    const xOf = (t2: number) => analysisReport(cycle(t2), analyseDocument(cycle(t2))).pathways[0]!.energeticSpan!.degreeOfTofControl.T2!;
    const doc = cycle(12, 1);
    const report = annotateReport(analysisReport(doc, analyseDocument(doc)), analyseUncertainty(doc, { samples: N, seed: 14 }));
    const span = report.pathways[0]!.energeticSpan!;
    const i = entryIntervalOf(span, 'degreeOfTofControl', 'T2')!;
    const within = (v: number, a: number, b: number) => v >= Math.min(a, b) && v <= Math.max(a, b);
    expect(within(i.low, xOf(12 - Z975 - TOL), xOf(12 - Z975 + TOL))).toBe(true);
    expect(within(i.high, xOf(12 + Z975 - TOL), xOf(12 + Z975 + TOL))).toBe(true);
    expect(within(i.median, xOf(12 - TOL), xOf(12 + TOL))).toBe(true);
    expect(span.degreeOfTofControl.T2).toBeCloseTo(xOf(12), 12);
    expect(uncertaintyText(report)).toMatch(/degree of TOF control: .*T2 0\.\d\d \[0\.\d\d, [01]\.\d\d\]/);
  });
});
