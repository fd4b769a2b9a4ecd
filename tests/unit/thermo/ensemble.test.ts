import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ensembleFreeEnergyJ, ensemblePopulations } from '../../../core/thermo/index.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { kcal, rel, toKcal } from './helpers.ts';

const T = 298.15;

// REFERENCE.md §8 Boltzmann checks (Boltzmann distribution, McQuarrie, Statistical Mechanics (1976)).
describe('ensembleFreeEnergyJ', () => {
  it('conformers 0.0, 0.5, 1.2 kcal/mol give G_eff = −0.264218906313 kcal/mol', () => {
    expect(rel(toKcal(ensembleFreeEnergyJ([0, 0.5, 1.2].map(kcal), T)), -0.264218906313)).toBeLessThan(1e-10);
  });
  it('two degenerate conformers give −RT ln 2 = −0.410679272418 kcal/mol', () => {
    expect(rel(toKcal(ensembleFreeEnergyJ([0, 0].map(kcal), T)), -0.410679272418)).toBeLessThan(1e-10);
  });
  it('TS conformers 15.0, 15.4 give 14.756186838, and the ensemble barrier 15.0204057443 kcal/mol', () => {
    const ts = ensembleFreeEnergyJ([15.0, 15.4].map(kcal), T);
    expect(rel(toKcal(ts), 14.756186838)).toBeLessThan(1e-9);
    const barrier = ts - ensembleFreeEnergyJ([0, 0.5, 1.2].map(kcal), T);
    expect(rel(toKcal(barrier), 15.0204057443)).toBeLessThan(1e-9);
  });
  it('competing TS ensembles {15.0, 15.4} vs {16.2, 16.5} give A:B = 7.13626841781', () => {
    const a = ensembleFreeEnergyJ([15.0, 15.4].map(kcal), T);
    const b = ensembleFreeEnergyJ([16.2, 16.5].map(kcal), T);
    expect(rel(Math.exp((b - a) / (GAS_CONSTANT * T)), 7.13626841781)).toBeLessThan(1e-9);
  });
  it('stays finite for absolute energies of a whole molecule (−1500 hartree ≈ −3.9e9 J/mol)', () => {
    const base = -3.9e9;
    const g = ensembleFreeEnergyJ([base, base + kcal(0.5), base + kcal(1.2)], T);
    expect(Number.isFinite(g)).toBe(true);
    expect(Math.abs(g - base - kcal(-0.264218906313))).toBeLessThan(1e-5);
  });
});

describe('ensemblePopulations', () => {
  it('are 0.6402155195, 0.2753110573, 0.08447342317 for 0.0, 0.5, 1.2 kcal/mol', () => {
    const p = ensemblePopulations([0, 0.5, 1.2].map(kcal), T);
    [0.6402155195, 0.2753110573, 0.08447342317].forEach((v, i) => expect(rel(p[i] ?? NaN, v)).toBeLessThan(1e-9));
  });
});

describe('ensemble properties (fast-check)', () => {
  const energies = fc.array(fc.double({ min: -2e5, max: 2e5, noNaN: true }), { minLength: 1, maxLength: 12 });
  const temperature = fc.double({ min: 50, max: 2000, noNaN: true });

  it('G_eff ≤ min G_i, and G_eff ≥ min G_i − RT ln n', () => {
    fc.assert(fc.property(energies, temperature, (g, t) => {
      const geff = ensembleFreeEnergyJ(g, t);
      const min = Math.min(...g);
      expect(geff).toBeLessThanOrEqual(min + 1e-9 * Math.abs(min));
      expect(geff).toBeGreaterThanOrEqual(min - GAS_CONSTANT * t * Math.log(g.length) - 1e-6 - 1e-12 * Math.abs(min));
    }));
  });
  it('shifting every energy by c shifts G_eff by c', () => {
    fc.assert(fc.property(energies, temperature, fc.double({ min: -1e6, max: 1e6, noNaN: true }), (g, t, c) => {
      const shifted = ensembleFreeEnergyJ(g.map((x) => x + c), t);
      expect(Math.abs(shifted - (ensembleFreeEnergyJ(g, t) + c))).toBeLessThan(1e-6);
    }));
  });
  it('populations sum to 1', () => {
    fc.assert(fc.property(energies, temperature, (g, t) => {
      expect(Math.abs(ensemblePopulations(g, t).reduce((s, p) => s + p, 0) - 1)).toBeLessThan(1e-12);
    }));
  });
});
