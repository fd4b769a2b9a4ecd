import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { rtJoules } from '../../../core/units/thermal.ts';
import { typed } from '../profile/builders.ts';

// Two-sided 95 % quantile of the standard normal, z₀.₉₇₅ = 1.959963985 (Abramowitz & Stegun, Table 26.5, from memory).
const Z975 = 1.959963985;
const RT_KCAL = rtJoules(298.15) / 4184;

describe('uncertainty: ee of two enantiomeric channels', () => {
  // Invented: one start, TSs at 15 and 15.8 kcal/mol, σ 1 kcal/mol each (independent), so ΔΔG‡ ~ N(0.8, 2).
  // ee = tanh(ΔΔG‡/2RT) (from r = exp(ΔΔG‡/RT) and ee = (r − 1)/(r + 1)) is monotone in ΔΔG‡ once signed
  // toward one product, so its percentiles are tanh((0.8 ∓ 1.959964·√2)/2RT) (normal quantiles).
  const pathway = (id: string, ts: number) => ({ id, name: id, points: [typed('R', 'min', 0), typed('TS', 'ts', ts, { energy: { mode: 'value', value: ts, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -10)] });
  const doc = makeDocument({ pathways: [pathway('S', 15), pathway('R', 15.8)], comparisons: [{ type: 'selectivity', pathways: ['S', 'R'], enantiomeric: true }] });
  const run = analyseUncertainty(doc, { samples: 40_000, seed: 8 });
  const ee = run.quantities.find((q) => q.key === 'comparison 0/ee')!;

  it('is signed toward the estimate\'s major product, so samples where the other wins count as negative', () => {
    const ddg = (x: number) => 2 * RT_KCAL * Math.atanh(x);
    // s.e. of a 2.5 % sample quantile of N normals: √(p(1−p)/N)/φ(z) ≈ 0.013 σ at N = 40 000; allow 4 s.e. (σ = √2 kcal/mol).
    const tol = 4 * (Math.sqrt(0.025 * 0.975 / 40_000) / 0.05844) * Math.SQRT2;
    expect(ee.interval!.low).toBeLessThan(0);
    expect(Math.abs(ddg(ee.interval!.low) - (0.8 - Z975 * Math.SQRT2))).toBeLessThan(tol);
    expect(Math.abs(ddg(ee.interval!.high) - (0.8 + Z975 * Math.SQRT2))).toBeLessThan(tol);
    expect(Math.abs(ddg(ee.interval!.median) - 0.8)).toBeLessThan(tol);
    expect(ee.point).toBeCloseTo(Math.tanh(0.8 / (2 * RT_KCAL)), 9);
  });
});
