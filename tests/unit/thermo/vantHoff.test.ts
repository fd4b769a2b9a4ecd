import { describe, expect, it } from 'vitest';
import { crossoverTemperatureK, equilibriumConstant, vantHoffEnthalpyJ, vantHoffK } from '../../../core/thermo/index.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { kj, rel } from './helpers.ts';

// REFERENCE.md §9 (van 't Hoff, Études de dynamique chimique (1884)), with R2 data of §4 (NIST-JANAF):
// ΔrH° = −91.796 kJ/mol, ΔrS° = −198.101 J/(mol K).
const dH = kj(-91.796);
const dS = -198.101;
const K298 = equilibriumConstant(dH - 298.15 * dS, 298.15);

describe('vantHoffK', () => {
  it('R2: K(298.15) = 542539.092802 from ΔH − TΔS', () => {
    expect(rel(K298, 542539.092802)).toBeLessThan(1e-9);
  });
  it.each([[400, 43.6074912142], [350, 2249.070286], [450, 2.030775084], [500, 0.1746394704], [600, 0.004404161892]])('R2: K(%s K) = %s', (t, k) => {
    expect(rel(vantHoffK(K298, 298.15, t, dH), k)).toBeLessThan(1e-8);
  });
  it('R2: ln(K400/K298.15) = −9.428786469828 = −(ΔrH°/R)(1/400 − 1/298.15)', () => {
    const ratio = Math.log(vantHoffK(K298, 298.15, 400, dH) / K298);
    expect(rel(ratio, -9.428786469828)).toBeLessThan(1e-11);
    expect(rel(ratio, (-dH / GAS_CONSTANT) * (1 / 400 - 1 / 298.15))).toBeLessThan(1e-12);
  });
  it('R2: K = 1 at T* = 463.3797911 K', () => {
    const tStar = crossoverTemperatureK(dH, dS) ?? NaN;
    expect(rel(tStar, 463.3797911)).toBeLessThan(1e-9);
    expect(Math.abs(vantHoffK(K298, 298.15, tStar, dH) - 1)).toBeLessThan(1e-9);
  });
  it('generic: ΔrH° = +50 kJ/mol, K(298.15) = 1e-3 → K(350) = 0.0198461050046', () => {
    expect(rel(vantHoffK(1e-3, 298.15, 350, kj(50)), 0.0198461050046)).toBeLessThan(1e-9);
  });
});

describe('vantHoffEnthalpyJ', () => {
  it('K doubling between 298.15 and 308.15 K means ΔrH° = 52.94886217 kJ/mol', () => {
    expect(rel(vantHoffEnthalpyJ(1, 298.15, 2, 308.15), kj(52.94886217))).toBeLessThan(1e-9);
  });
});
