import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { convertEnergy, ENERGY_UNITS, parseEnergyUnit } from '../../../core/units/energy.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { kbtOverH, rtJoules } from '../../../core/units/thermal.ts';

// Check values: CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)) and the
// derived conversion table of REFERENCE.md §1; thermochemical calorie 4.184 J (NIST SP 811).
const close = (actual: number, expected: number, rel: number) =>
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThan(rel);

describe('CODATA 2018 constants', () => {
  it('gas constant R = N_A k_B is 8.31446261815324 J/(mol K) (exact)', () => {
    close(GAS_CONSTANT, 8.31446261815324, 1e-14);
  });
  it('k_B T/h at 298.15 K is 6.212437991620116e12 s⁻¹ (exact)', () => {
    close(kbtOverH(298.15), 6.212437991620116e12, 1e-13);
  });
  it('RT at 298.15 K is 2.478957029602389 kJ/mol (exact)', () => {
    close(rtJoules(298.15), 2478.957029602389, 1e-13);
  });
});

describe('convertEnergy', () => {
  const table: [string, number, Parameters<typeof convertEnergy>[1], Parameters<typeof convertEnergy>[2], number][] = [
    ['1 hartree -> kJ/mol (E_h N_A / 1000)', 1, 'hartree', 'kJ/mol', 2625.499639479825],
    ['1 hartree -> kcal/mol', 1, 'hartree', 'kcal/mol', 627.5094740630558],
    ['1 hartree -> cm⁻¹', 1, 'hartree', 'cm-1', 219474.6313631965],
    ['1 hartree -> eV (CODATA lists 27.211386245988)', 1, 'hartree', 'eV', 27.21138624598803],
    ['1 eV -> kJ/mol (= F/1000, exact)', 1, 'eV', 'kJ/mol', 96.4853321233100184],
    ['1 eV -> kcal/mol (exact)', 1, 'eV', 'kcal/mol', 23.06054783061903],
    ['1 cm⁻¹ -> kJ/mol (exact)', 1, 'cm-1', 'kJ/mol', 0.0119626565638697],
    ['1 cm⁻¹ -> kcal/mol (exact)', 1, 'cm-1', 'kcal/mol', 0.002859143538209776],
    ['1 kcal/mol -> kJ/mol (thermochemical calorie)', 1, 'kcal/mol', 'kJ/mol', 4.184],
    ['1 kJ/mol -> kcal/mol', 1, 'kJ/mol', 'kcal/mol', 0.2390057361376673],
  ];
  it.each(table)('%s', (_name, value, from, to, expected) => {
    close(convertEnergy(value, from, to), expected, 1e-12);
    close(convertEnergy(expected, to, from), value, 1e-12);
  });

  it('uses the thermochemical calorie, not the International Table one (4.1868 J)', () => {
    expect(Math.abs(convertEnergy(1, 'kcal/mol', 'kJ/mol') - 4.1868)).toBeGreaterThan(1e-3);
  });

  it('round-trips any value through any pair of units (property)', () => {
    const unit = fc.constantFrom(...ENERGY_UNITS);
    fc.assert(fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), unit, unit, (v, a, b) => {
      const back = convertEnergy(convertEnergy(v, a, b), b, a);
      return Math.abs(back - v) <= 1e-12 * Math.max(1, Math.abs(v));
    }));
  });
});

describe('parseEnergyUnit', () => {
  it('reads the spellings people type', () => {
    expect(parseEnergyUnit('kJ/mol')).toBe('kJ/mol');
    expect(parseEnergyUnit(' KCAL/MOL ')).toBe('kcal/mol');
    expect(parseEnergyUnit('Eh')).toBe('hartree');
    expect(parseEnergyUnit('cm^-1')).toBe('cm-1');
    expect(parseEnergyUnit('furlongs')).toBeUndefined();
  });
});
