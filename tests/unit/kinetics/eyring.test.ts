import { describe, expect, it } from 'vitest';
import { equilibriumConstant, eyringRate, halfLifeFirstOrder, logEquilibriumConstant, logEyringRate, rateUnit } from '../../../core/kinetics/index.ts';
import { kcal, rel } from './build.ts';

const T = 298.15;

describe('eyringRate', () => {
  // REFERENCE.md §2 worked checks, Eyring J. Chem. Phys. 3, 107 (1935); 298.15 K, κ = 1, m = 1.
  const table: [number, number, number][] = [
    [15, 62.8327064952, 0.0110316301688],
    [20, 0.0135881500479, 51.0111514899],
    [23, 8.59300518801e-5, 8066.41175461],
    [25, 2.93856228742e-6, 235879.696519],
  ];
  for (const [barrier, k, halfLife] of table) {
    it(`gives k and t½ for ΔG‡ = ${barrier} kcal/mol`, () => {
      const r = eyringRate(kcal(barrier), T);
      expect(rel(r.k, k)).toBeLessThan(1e-9);
      expect(rel(halfLifeFirstOrder(r.k), halfLife)).toBeLessThan(1e-9);
      expect(r.unit).toBe('s⁻¹');
      expect(r.logK).toBeCloseTo(Math.log(k), 9);
    });
  }

  it('scales with the transmission coefficient', () => {
    // REFERENCE.md §2: κ = 0.5, ΔG‡ = 20 kcal/mol → 0.00679407502394 s⁻¹.
    expect(rel(eyringRate(kcal(20), T, { transmission: 0.5 }).k, 0.00679407502394)).toBeLessThan(1e-9);
  });

  it('keeps the number and changes the unit for a bimolecular step at c° = 1 mol/L', () => {
    // REFERENCE.md §2 molecularity check (IUPAC Gold Book "enthalpy of activation"): m = 2, 20 kcal/mol → 0.0135881500479 L mol⁻¹ s⁻¹.
    const r = eyringRate(kcal(20), T, { molecularity: 2 });
    expect(rel(r.k, 0.0135881500479)).toBeLessThan(1e-9);
    expect(r.unit).toBe('M⁻¹ s⁻¹');
    // pseudo-first-order with [B] = 0.100 M: t½ = 510.111514899 s (same section).
    expect(rel(halfLifeFirstOrder(r.k * 0.1), 510.111514899)).toBeLessThan(1e-9);
    expect(rateUnit(1)).toBe('s⁻¹');
    expect(rateUnit(3)).toBe('M⁻² s⁻¹');
  });

  it('reaches k_BT/h at zero barrier at other temperatures', () => {
    // REFERENCE.md §2: k_BT/h at 273.15 K and 373.15 K (CODATA 2018 exact constants).
    expect(rel(eyringRate(0, 273.15).k, 5.69152251354e12)).toBeLessThan(1e-10);
    expect(rel(eyringRate(0, 373.15).k, 7.77518442587e12)).toBeLessThan(1e-10);
  });

  it('changes k by exp(4184/RT) per kcal/mol', () => {
    // REFERENCE.md §2 sensitivity: factor 5.40760656537 at 298.15 K.
    expect(rel(eyringRate(kcal(19), T).k / eyringRate(kcal(20), T).k, 5.40760656537)).toBeLessThan(1e-10);
  });

  it('stays finite in log form where k underflows', () => {
    // 600 kcal/mol: k = k_BT/h · e^(−1012.7) underflows float64; ln k does not (ln(k_BT/h) from REFERENCE.md §1 k_BT/h at 298.15 K).
    const lnK = logEyringRate(kcal(600), T);
    expect(Number.isFinite(lnK)).toBe(true);
    expect(lnK).toBeCloseTo(Math.log(6.212437991620116e12) - kcal(600) / (8.31446261815324 * T), 9);
    expect(eyringRate(kcal(600), T).k).toBe(0);
  });

  it('refuses a non-positive temperature (programmer error)', () => {
    expect(() => logEyringRate(1000, 0)).toThrow(/temperature/);
    expect(() => logEyringRate(1000, Number.NaN)).toThrow(/temperature/);
  });
});

describe('equilibriumConstant', () => {
  it('follows K = exp(−ΔG/RT)', () => {
    // REFERENCE.md §1: RT ln 10 = 1.36424701303424 kcal/mol at 298.15 K, so ΔG = −that gives K = 10.
    expect(rel(equilibriumConstant(kcal(-1.36424701303424), T), 10)).toBeLessThan(1e-12);
    // REFERENCE.md §9: ΔrG of N₂ + 3H₂ → 2NH₃ from ΔrH = −91.796 kJ/mol, ΔrS = −198.101 J/(mol K) → K(298.15) = 542539.092802 (NIST-JANAF).
    expect(rel(equilibriumConstant(-91796 + T * 198.101, T), 542539.092802)).toBeLessThan(1e-9);
    expect(equilibriumConstant(0, T)).toBe(1);
    expect(logEquilibriumConstant(kcal(2), T)).toBeCloseTo(-kcal(2) / (8.31446261815324 * T), 12);
  });
});
