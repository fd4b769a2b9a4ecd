import { Matrix, inverse, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { eyringFit, linearFit, type RatePoint } from '../../../core/thermo/index.ts';
import { BOLTZMANN, CALORIE_J, GAS_CONSTANT, PLANCK } from '../../../core/units/constants.ts';
import { kcal, rel } from './helpers.ts';

// REFERENCE.md §3 synthetic check: Δ‡H = 18.0 kcal/mol, Δ‡S = −10.0 cal/(mol K), first order, κ = 1,
// k(T) = (k_BT/h) exp(Δ‡S/R) exp(−Δ‡H/RT) (Eyring, J. Chem. Phys. 3, 107 (1935)).
const dH = kcal(18);
const dS = -10 * CALORIE_J;
const temps = [278.15, 288.15, 298.15, 308.15, 318.15];
const eyringK = (t: number): number => ((BOLTZMANN * t) / PLANCK) * Math.exp(dS / GAS_CONSTANT) * Math.exp(-dH / (GAS_CONSTANT * t));
const exact: RatePoint[] = temps.map((t) => ({ temperatureK: t, k: eyringK(t) }));

describe('eyringFit on exact Eyring data', () => {
  it('the generated k match the REFERENCE.md §3 table', () => {
    [2.72180346210193e-4, 8.72991382477995e-4, 0.00259248254739523, 0.00718148522001673, 0.0186783623365512]
      .forEach((k, i) => expect(rel(exact[i]?.k ?? NaN, k)).toBeLessThan(1e-12));
  });
  it('slope −9057.951602977784 K and intercept 18.72778247551656 → ΔH‡ = 18 kcal/mol, ΔS‡ = −10 cal/(mol K)', () => {
    const r = eyringFit(exact);
    if (!r.ok) throw new Error(r.message);
    expect(rel(r.value.line.slope, -9057.951602977784)).toBeLessThan(1e-9);
    expect(rel(r.value.line.intercept, 18.72778247551656)).toBeLessThan(1e-9);
    expect(rel(r.value.dHJ, dH)).toBeLessThan(1e-9);
    expect(rel(r.value.dSJK, dS)).toBeLessThan(1e-9);
    // Exact data: residuals are round-off only, so the standard errors vanish.
    expect(r.value.dHSE).not.toBeNull();
    expect(r.value.dHSE!).toBeLessThan(1e-6);
    expect(r.value.dSSE!).toBeLessThan(1e-8);
  });
  it('two points give the parameters but no standard errors', () => {
    const r = eyringFit(exact.slice(0, 2));
    if (!r.ok) throw new Error(r.message);
    expect(rel(r.value.dHJ, dH)).toBeLessThan(1e-9);
    expect(r.value.dHSE).toBeNull();
    expect(r.value.dSSE).toBeNull();
  });
  it('a bimolecular step uses ln(k c°/T): same line for k in L mol⁻¹ s⁻¹ at c° = 1 M', () => {
    const r = eyringFit(exact, { molecularity: 2 });
    expect(r.ok && rel(r.value.dHJ, dH)).toBeLessThan(1e-9);
  });
  it('refuses one point, equal temperatures and non-positive k with a message', () => {
    const msg = (p: RatePoint[]): string => { const r = eyringFit(p); return r.ok ? '' : r.message; };
    expect(msg(exact.slice(0, 1))).toContain('at least 2 points');
    expect(msg([{ temperatureK: 300, k: 1 }, { temperatureK: 300, k: 2 }])).toContain('all temperatures are equal');
    expect(msg([{ temperatureK: 300, k: 1 }, { temperatureK: 310, k: 0 }])).toBe('point 2: rate constant must be positive, got 0');
  });
});

describe('eyringFit standard errors on noisy data', () => {
  // Fixed ±3 % multiplicative noise on k, checked against an independent least-squares solution
  // with ml-matrix: β = (XᵀX)⁻¹Xᵀy, Cov(β) = s² (XᵀX)⁻¹ (ordinary least squares).
  const noise = [0.03, -0.02, 0.025, -0.03, 0.01, -0.015, 0.02];
  const temps7 = [278.15, 288.15, 298.15, 308.15, 318.15, 328.15, 338.15];
  const noisy: RatePoint[] = temps7.map((t, i) => ({ temperatureK: t, k: eyringK(t) * (1 + (noise[i] ?? 0)) }));

  it('matches the ml-matrix least-squares solution and covariance', () => {
    const X = new Matrix(noisy.map((p) => [1 / p.temperatureK, 1]));
    const y = Matrix.columnVector(noisy.map((p) => Math.log(p.k / p.temperatureK)));
    const beta = solve(X, y);
    const resid = y.clone().sub(X.mmul(beta));
    const s2 = resid.transpose().mmul(resid).get(0, 0) / (noisy.length - 2);
    const cov = inverse(X.transpose().mmul(X)).mul(s2);
    const r = eyringFit(noisy);
    if (!r.ok) throw new Error(r.message);
    expect(rel(r.value.line.slope, beta.get(0, 0))).toBeLessThan(1e-8);
    expect(rel(r.value.line.intercept, beta.get(1, 0))).toBeLessThan(1e-8);
    expect(rel(r.value.line.slopeSE!, Math.sqrt(cov.get(0, 0)))).toBeLessThan(1e-6);
    expect(rel(r.value.line.interceptSE!, Math.sqrt(cov.get(1, 1)))).toBeLessThan(1e-6);
    expect(rel(r.value.dHSE!, GAS_CONSTANT * Math.sqrt(cov.get(0, 0)))).toBeLessThan(1e-6);
    expect(rel(r.value.dSSE!, GAS_CONSTANT * Math.sqrt(cov.get(1, 1)))).toBeLessThan(1e-6);
    // The noisy fit stays near the true values, within a few standard errors.
    expect(Math.abs(r.value.dHJ - dH)).toBeLessThan(4 * r.value.dHSE!);
  });
});

describe('linearFit', () => {
  it('fits a known line and reports SE = 0 for exact data', () => {
    const r = linearFit([1, 2, 3, 4], [3, 5, 7, 9]);
    expect(r.ok && r.value).toMatchObject({ slope: 2, intercept: 1, slopeSE: 0, interceptSE: 0, n: 4 });
  });
  it('textbook case y = [1, 2, 2] on x = [0, 1, 2]: slope 0.5, SE(slope) = √(1/6)/√2 (hand computation)', () => {
    const r = linearFit([0, 1, 2], [1, 2, 2]);
    if (!r.ok) throw new Error(r.message);
    expect(r.value.slope).toBeCloseTo(0.5, 14);
    expect(r.value.intercept).toBeCloseTo(7 / 6, 14);
    // Residuals −1/6, 1/3, −1/6: SSR = 1/6, s² = 1/6, Sxx = 2.
    expect(r.value.slopeSE).toBeCloseTo(Math.sqrt(1 / 6 / 2), 14);
    expect(r.value.interceptSE).toBeCloseTo(Math.sqrt((1 / 6) * (1 / 3 + 1 / 2)), 14);
  });
});
