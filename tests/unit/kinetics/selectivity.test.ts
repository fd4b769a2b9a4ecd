import { describe, expect, it } from 'vitest';
import { boltzmannEnergy, boltzmannPopulations, ddgFromRatio, eeFromDdg, eeFromRatio, productDistribution, ratioFromDdg } from '../../../core/kinetics/index.ts';
import { kcal, rel, toKcal } from './build.ts';

const T = 298.15;

describe('ratio, ΔΔG‡ and ee', () => {
  // REFERENCE.md §8 table (IUPAC Gold Book "Curtin–Hammett principle"; ee algebra derived): r ↔ ΔΔG‡ at 298.15 K.
  const table: [number, number, number][] = [
    [4, 0.8213585448, 0.6],
    [9, 1.301822493, 0.8],
    [19, 1.744535781, 0.9],
    [49, 2.305844954, 0.96],
    [99, 2.722539353, 0.98],
    [199, 3.136203443, 0.99],
  ];
  for (const [r, ddg, ee] of table) {
    it(`links ${r}:1 with ${ddg} kcal/mol and ee ${ee}`, () => {
      expect(rel(toKcal(ddgFromRatio(r, T)), ddg)).toBeLessThan(1e-9);
      expect(rel(ratioFromDdg(kcal(ddg), T), r)).toBeLessThan(1e-9);
      expect(eeFromRatio(r)).toBeCloseTo(ee, 12);
      expect(rel(eeFromDdg(kcal(ddg), T), ee)).toBeLessThan(1e-9);
    });
  }

  it('uses the temperature', () => {
    // REFERENCE.md §8 other temperatures: 95:5 ↔ 1.141862008 (195.15 K), 2.066351873 (353.15 K) kcal/mol.
    expect(rel(toKcal(ddgFromRatio(19, 195.15)), 1.141862008)).toBeLessThan(1e-9);
    expect(rel(toKcal(ddgFromRatio(19, 353.15)), 2.066351873)).toBeLessThan(1e-9);
  });
});

describe('boltzmannEnergy', () => {
  it('gives G_eff and populations of a conformer ensemble', () => {
    // REFERENCE.md §8 Boltzmann checks: G = 0.0, 0.5, 1.2 kcal/mol → G_eff = −0.264218906313, p = 0.6402155195, 0.2753110573, 0.08447342317.
    const g = [0, 0.5, 1.2].map(kcal);
    expect(rel(toKcal(boltzmannEnergy(g, T)), -0.264218906313)).toBeLessThan(1e-9);
    boltzmannPopulations(g, T).forEach((p, i) => expect(rel(p, [0.6402155195, 0.2753110573, 0.08447342317][i]!)).toBeLessThan(1e-9));
    // two degenerate conformers: −RT ln 2 = −0.410679272418 (same section).
    expect(rel(toKcal(boltzmannEnergy([0, 0], T)), -0.410679272418)).toBeLessThan(1e-9);
    // TS conformers 15.0, 15.4 → 14.756186838 (same section).
    expect(rel(toKcal(boltzmannEnergy([15, 15.4].map(kcal), T)), 14.756186838)).toBeLessThan(1e-9);
  });

  it('does not overflow for energies of hundreds of kcal/mol', () => {
    // shift invariance of the same §8 ensemble: +800 kcal/mol on every member moves G_eff by exactly 800.
    expect(toKcal(boltzmannEnergy([800, 800.5, 801.2].map(kcal), T))).toBeCloseTo(800 - 0.264218906313, 9);
    expect(() => boltzmannEnergy([], T)).toThrow(RangeError);
  });
});

describe('productDistribution', () => {
  it('Boltzmann-sums each channel (ensemble A:B = 7.13626841781)', () => {
    // REFERENCE.md §8: TS_A = {15.0, 15.4}, TS_B = {16.2, 16.5} → A:B = 7.13626841781, 87.70935337 % A.
    const r = productDistribution([
      { id: 'A', label: 'A', tsEnergiesJ: [15, 15.4].map(kcal) },
      { id: 'B', label: 'B', tsEnergiesJ: [16.2, 16.5].map(kcal) },
    ], T);
    expect(rel(r.pair!.ratio, 7.13626841781)).toBeLessThan(1e-9);
    expect(rel(r.channels[0]!.percent, 87.70935337)).toBeLessThan(1e-9);
    expect(r.pair!.major).toBe('A');
    expect(rel(r.pair!.ee, (7.13626841781 - 1) / (7.13626841781 + 1))).toBeLessThan(1e-9);
  });

  it('matches the forward checks for single TSs, in either order', () => {
    // REFERENCE.md §8 forward checks: ΔΔG‡ = 2.0 kcal/mol → r = 29.24220877, major 96.69336321 %, ee 93.38672643 %.
    const r = productDistribution([
      { id: 'minor', label: 'minor', tsEnergiesJ: [kcal(12)] },
      { id: 'major', label: 'major', tsEnergiesJ: [kcal(10)] },
    ], T);
    expect(rel(r.pair!.er, 29.24220877)).toBeLessThan(1e-9);
    expect(rel(1 / r.pair!.ratio, 29.24220877)).toBeLessThan(1e-9);
    expect(r.pair!.major).toBe('major');
    expect(rel(r.channels[1]!.percent, 96.69336321)).toBeLessThan(1e-9);
    expect(rel(r.pair!.ee, 0.9338672643)).toBeLessThan(1e-9);
    expect(r.pair!.ddgJ).toBeCloseTo(kcal(-2), 9);
  });

  it('shares products among three channels and sums to 100 %', () => {
    // REFERENCE.md §8 forward checks: 1.0 and 3.0 kcal/mol gaps → factors 5.407606565 and 158.1303601.
    const r = productDistribution([0, 1, 3].map((e, i) => ({ id: `c${i}`, label: `c${i}`, tsEnergiesJ: [kcal(e)] })), T);
    const total = 1 + 1 / 5.407606565 + 1 / 158.1303601;
    expect(rel(r.channels[0]!.fraction, 1 / total)).toBeLessThan(1e-9);
    expect(r.channels.reduce((a, c) => a + c.percent, 0)).toBeCloseTo(100, 10);
  });
});

describe('productDistribution with three products', () => {
  it('ratio and ΔΔG‡ describe the two major products, named, not the first two listed', async () => {
    const { productDistribution } = await import('../../../core/kinetics/productDistribution.ts');
    // TS 18.0 (minor), 15.0, 16.0 kcal/mol: the two majors differ by 1.0 kcal/mol ⇒ r = 5.407606565 (REFERENCE.md §8).
    const r = productDistribution([
      { id: 'x', label: 'X', tsEnergiesJ: [18 * 4184] },
      { id: 'y', label: 'Y', tsEnergiesJ: [15 * 4184] },
      { id: 'z', label: 'Z', tsEnergiesJ: [16 * 4184] },
    ], 298.15);
    expect(r.pair!.of).toEqual(['y', 'z']);
    expect([r.pair!.major, r.pair!.minor]).toEqual(['y', 'z']);
    expect(Math.abs(r.pair!.ratio / 5.407606565 - 1)).toBeLessThan(1e-9);
  });
});
