import { describe, expect, it } from 'vitest';
import { barrierFromHalfLifeJ, barrierFromRateConstantJ } from '../../../core/thermo/index.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { rel, toKcal } from './helpers.ts';

// REFERENCE.md §2: Eyring, J. Chem. Phys. 3, 107 (1935); IUPAC Gold Book 'Gibbs energy of activation'.
// 298.15 K, κ = 1, first order unless stated.
const T = 298.15;

describe('barrierFromRateConstantJ', () => {
  it.each([
    [62.8327064952, 15],
    [0.0135881500479, 20],
    [8.59300518801e-5, 23],
    [2.93856228742e-6, 25],
  ])('k = %s s⁻¹ → Δ‡G = %s kcal/mol', (k, barrier) => {
    expect(Math.abs(toKcal(barrierFromRateConstantJ(k, T)) - barrier)).toBeLessThan(1e-9);
  });
  it('κ = 0.5: k = 0.00679407502394 s⁻¹ ↔ 20 kcal/mol', () => {
    expect(Math.abs(toKcal(barrierFromRateConstantJ(0.00679407502394, T, { transmission: 0.5 })) - 20)).toBeLessThan(1e-9);
  });
  it('m = 2 at c° = 1 mol/L: k = 0.0135881500479 L mol⁻¹ s⁻¹ ↔ 20 kcal/mol', () => {
    expect(Math.abs(toKcal(barrierFromRateConstantJ(0.0135881500479, T, { molecularity: 2 })) - 20)).toBeLessThan(1e-9);
  });
  it('bimolecular, 1 M standard state: k = 0.3324395764 L mol⁻¹ s⁻¹ ↔ 18.10567155 kcal/mol (§5)', () => {
    expect(rel(toKcal(barrierFromRateConstantJ(0.3324395764, T, { molecularity: 2 })), 18.10567155)).toBeLessThan(1e-9);
  });
  it('a different c° enters as (c°)^(1−m): m = 2, c° = 1000 mol/m³ in SI units shifts by RT ln 1000', () => {
    const a = barrierFromRateConstantJ(1, T, { molecularity: 2 });
    const b = barrierFromRateConstantJ(1, T, { molecularity: 2, standardConcentration: 1000 });
    expect(rel(a - b, GAS_CONSTANT * T * Math.log(1000))).toBeLessThan(1e-12);
  });
  it('one decade of k is RT ln 10 = 1.36424701303424 kcal/mol at 298.15 K (§1)', () => {
    expect(rel(toKcal(barrierFromRateConstantJ(1, T) - barrierFromRateConstantJ(10, T)), 1.36424701303424)).toBeLessThan(1e-12);
  });
});

describe('barrierFromHalfLifeJ', () => {
  it.each([
    [1, 17.67032295],
    [60, 20.09616048],
    [3600, 22.52199802],
    [8 * 3600, 23.75403583],
    [24 * 3600, 24.40494708],
    [7 * 24 * 3600, 25.55786956],
  ])('t½ = %s s → %s kcal/mol', (t, barrier) => {
    expect(rel(toKcal(barrierFromHalfLifeJ(t, T)), barrier)).toBeLessThan(1e-9);
  });
  it.each([[0.0110316301688, 15], [51.0111514899, 20], [8066.41175461, 23], [235879.696519, 25]])('t½ = %s s ↔ %s kcal/mol', (t, barrier) => {
    expect(Math.abs(toKcal(barrierFromHalfLifeJ(t, T)) - barrier)).toBeLessThan(1e-9);
  });
  it('pseudo-first-order t½ = 510.111514899 s ↔ 20 kcal/mol bimolecular at [B] = 0.100 M', () => {
    const kPrime = Math.LN2 / 510.111514899;
    expect(Math.abs(toKcal(barrierFromRateConstantJ(kPrime / 0.1, T, { molecularity: 2 })) - 20)).toBeLessThan(1e-9);
  });
});
