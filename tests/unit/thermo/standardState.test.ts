import { describe, expect, it } from 'vitest';
import { neatSolventCorrectionJ, standardStateCorrectionJ } from '../../../core/thermo/index.ts';
import { kcal, rel, toKcal } from './helpers.ts';

// REFERENCE.md §5: RT ln(RT c°/p°), Ben-Naim & Marcus, J. Chem. Phys. 81, 2016 (1984);
// neat solvent RT ln[S], Bryantsev, Diallo & Goddard, J. Phys. Chem. B 112, 9709 (2008).
describe('standardStateCorrectionJ', () => {
  it('1 atm → 1 M at 298.15 K is 1.89432844549 kcal/mol (7.92587021595 kJ/mol)', () => {
    expect(rel(toKcal(standardStateCorrectionJ(298.15, '1atm')), 1.89432844549)).toBeLessThan(1e-10);
    expect(rel(standardStateCorrectionJ(298.15, '1atm'), 7925.87021595)).toBeLessThan(1e-10);
  });
  it('1 bar → 1 M at 298.15 K is 1.9021273169 kcal/mol', () => {
    expect(rel(toKcal(standardStateCorrectionJ(298.15, '1bar')), 1.9021273169)).toBeLessThan(1e-10);
  });
  it.each([[273.15, 1.6879518], [323.15, 2.1048757], [373.15, 2.5372353]])('depends on T: %s K → %s kcal/mol (1 atm)', (t, v) => {
    expect(rel(toKcal(standardStateCorrectionJ(t, '1atm')), v)).toBeLessThan(1e-7);
  });
  it('applied per species, it gives the worked association, dissociation and bimolecular-TS values', () => {
    const c = standardStateCorrectionJ(298.15, '1atm');
    expect(rel(toKcal(kcal(5) - c), 3.105671555)).toBeLessThan(1e-9); // A + B → AB, Δn = −1
    expect(rel(toKcal(kcal(5) + c), 6.894328445)).toBeLessThan(1e-9); // AB → A + B
    expect(rel(toKcal(kcal(5) - 2 * c), 1.211343109)).toBeLessThan(1e-9); // termolecular
    expect(rel(toKcal(kcal(20) - c), 18.10567155)).toBeLessThan(1e-9); // A + B → [TS]‡
  });
});

describe('neatSolventCorrectionJ', () => {
  it('water at 55.5 M: RT ln 55.5 = 2.379646492 kcal/mol at 298.15 K', () => {
    expect(rel(toKcal(neatSolventCorrectionJ(298.15, 55.5)), 2.379646492)).toBeLessThan(1e-9);
  });
  it('water at 55.344685 M (997.05 g/L): 2.377986119 kcal/mol', () => {
    expect(rel(toKcal(neatSolventCorrectionJ(298.15, 55.344685)), 2.377986119)).toBeLessThan(1e-8);
  });
  it('a step consuming one water (+3.000 kcal/mol at 1 M) becomes 0.6203535079 kcal/mol with neat water', () => {
    expect(rel(toKcal(kcal(3) - neatSolventCorrectionJ(298.15, 55.5)), 0.6203535079)).toBeLessThan(1e-9);
  });
  it('gas at 1 atm to neat water sums both terms: 4.273974938 kcal/mol', () => {
    expect(rel(toKcal(standardStateCorrectionJ(298.15, '1atm') + neatSolventCorrectionJ(298.15, 55.5)), 4.273974938)).toBeLessThan(1e-9);
  });
  it('is zero at 1 M', () => {
    expect(neatSolventCorrectionJ(298.15, 1)).toBe(0);
  });
});
