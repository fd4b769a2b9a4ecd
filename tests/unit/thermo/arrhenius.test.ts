import { describe, expect, it } from 'vitest';
import { arrheniusFit, arrheniusTwoPoint, type RatePoint } from '../../../core/thermo/index.ts';
import { BOLTZMANN, CALORIE_J, GAS_CONSTANT, PLANCK } from '../../../core/units/constants.ts';
import { kcal, rel, toKcal } from './helpers.ts';

// REFERENCE.md §3 Arrhenius checks on the synthetic Eyring data (Δ‡H = 18 kcal/mol, Δ‡S = −10 cal/(mol K));
// E_a definition: IUPAC Gold Book 'activation energy'.
const dH = kcal(18);
const dS = -10 * CALORIE_J;
const point = (t: number): RatePoint => ({ temperatureK: t, k: ((BOLTZMANN * t) / PLANCK) * Math.exp(dS / GAS_CONSTANT - dH / (GAS_CONSTANT * t)) });
const temps = [278.15, 288.15, 298.15, 308.15, 318.15];

describe('arrheniusTwoPoint', () => {
  it.each([[298.15, 308.15, 18.602311711983], [278.15, 318.15, 18.590705982877], [288.15, 298.15, 18.582435941901]])('%s/%s K → E_a = %s kcal/mol', (t1, t2, ea) => {
    const r = arrheniusTwoPoint(point(t1), point(t2));
    if (!r.ok) throw new Error(r.message);
    expect(rel(toKcal(r.value.eaJ), ea)).toBeLessThan(1e-10);
    // Exact identity for Eyring data: E_a = Δ‡H + R T1 T2 ln(T2/T1)/(T2 − T1) (REFERENCE.md §3, derived).
    expect(rel(r.value.eaJ, dH + (GAS_CONSTANT * t1 * t2 * Math.log(t2 / t1)) / (t2 - t1))).toBeLessThan(1e-10);
    // ln A reproduces both rate constants.
    expect(rel(Math.exp(r.value.lnA - r.value.eaJ / (GAS_CONSTANT * t2)), point(t2).k)).toBeLessThan(1e-10);
  });
  it('refuses equal temperatures', () => {
    expect(arrheniusTwoPoint(point(300), point(300)).ok).toBe(false);
  });
});

describe('arrheniusFit', () => {
  it('all five points: E_a = 18.590505763712 kcal/mol, ln A = 25.423162590987', () => {
    const r = arrheniusFit(temps.map(point));
    if (!r.ok) throw new Error(r.message);
    expect(rel(toKcal(r.value.eaJ), 18.590505763712)).toBeLessThan(1e-10);
    expect(rel(r.value.lnA, 25.423162590987)).toBeLessThan(1e-10);
    // Eyring data are not exactly linear in ln k vs 1/T (ln T term), so the SE is small but not zero.
    expect(r.value.eaSE).toBeGreaterThan(0);
    expect(r.value.eaSE!).toBeLessThan(kcal(0.01));
    expect(r.value.lnASE).not.toBeNull();
  });
  it('two points agree with the two-point formula and have no SE', () => {
    const fit = arrheniusFit([point(298.15), point(308.15)]);
    const two = arrheniusTwoPoint(point(298.15), point(308.15));
    expect(fit.ok && two.ok && rel(fit.value.eaJ, two.value.eaJ)).toBeLessThan(1e-10);
    expect(fit.ok && fit.value.eaSE).toBeNull();
  });
  it('is close to the point value Δ‡H + RT = 18.592484949714 kcal/mol at 298.15 K (REFERENCE.md §3)', () => {
    const r = arrheniusFit(temps.map(point));
    expect(r.ok && Math.abs(toKcal(r.value.eaJ) - 18.592484949714)).toBeLessThan(0.01);
  });
});
