import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { marcusBarrier } from '../../../core/thermo/index.ts';
import { kbtOverH, rtJoules } from '../../../core/units/thermal.ts';
import { toJoulesPerMol } from '../../../core/units/energy.ts';
import { kcal, kj, rel, toKcal } from './helpers.ts';

// REFERENCE.md §7: Marcus, J. Chem. Phys. 24, 966 (1956); IUPAC Gold Book 'Marcus equation';
// α = ½(1 + ΔG°/λ) (Leffler, Science 117, 340 (1953)). λ = 20 kcal/mol, 298.15 K.
describe('marcusBarrier', () => {
  it.each([
    [10, 11.25, 0.75, 35233.42335],
    [0, 5.0, 0.5, 1.343496792e9],
    [-10, 1.25, 0.25, 7.533654663e11],
    [-20, 0.0, 0.0, 6.212437992e12],
    [-30, 1.25, -0.25, 7.533654663e11],
    [-40, 5.0, -0.5, 1.343496792e9],
  ])('ΔG° = %s kcal/mol → Δ‡G = %s, α = %s, k = %s s⁻¹', (dG, barrier, alpha, k) => {
    const m = marcusBarrier(kcal(dG), kcal(20));
    expect(Math.abs(toKcal(m.barrierJ) - barrier)).toBeLessThan(1e-12);
    expect(m.alpha).toBeCloseTo(alpha, 14);
    expect(rel(kbtOverH(298.15) * Math.exp(-m.barrierJ / rtJoules(298.15)), k)).toBeLessThan(1e-9);
    expect(m.inverted).toBe(dG < -20);
  });
  it('λ = 100 kJ/mol, ΔG° = −25 kJ/mol → 14.0625 kJ/mol', () => {
    expect(marcusBarrier(kj(-25), kj(100)).barrierJ).toBeCloseTo(kj(14.0625), 9);
  });
  it('λ = 1.0 eV, ΔG° = −0.3 eV → 0.1225 eV = 2.824917109 kcal/mol', () => {
    const m = marcusBarrier(toJoulesPerMol(-0.3, 'eV'), toJoulesPerMol(1, 'eV'));
    expect(rel(toKcal(m.barrierJ), 2.824917109)).toBeLessThan(1e-9);
  });
  it('agrees with the intrinsic-barrier form Δ‡G₀ + ΔG°/2 + ΔG°²/(16Δ‡G₀) (Marcus, J. Phys. Chem. 72, 891 (1968))', () => {
    fc.assert(fc.property(fc.double({ min: -3e5, max: 3e5, noNaN: true }), fc.double({ min: 1e3, max: 4e5, noNaN: true }), (dG, lambda) => {
      const g0 = lambda / 4;
      const intrinsic = g0 + dG / 2 + (dG * dG) / (16 * g0);
      expect(Math.abs(marcusBarrier(dG, lambda).barrierJ - intrinsic)).toBeLessThan(1e-9 * Math.max(1, intrinsic));
    }));
  });
  it('is symmetric about ΔG° = −λ (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 2e5, noNaN: true }), fc.double({ min: 1e3, max: 4e5, noNaN: true }), (d, lambda) => {
      const a = marcusBarrier(-lambda + d, lambda).barrierJ;
      const b = marcusBarrier(-lambda - d, lambda).barrierJ;
      expect(Math.abs(a - b)).toBeLessThan(1e-9 * Math.max(1, a));
    }));
  });
  it('refuses a non-positive λ as a programmer error', () => {
    expect(() => marcusBarrier(0, 0)).toThrow(RangeError);
  });
});
