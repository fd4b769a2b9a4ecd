import { describe, expect, it } from 'vitest';
import { energyHeading, formatEnergy, formatFixed } from '../../../../ui/format/formatEnergy.ts';

describe('formatEnergy', () => {
  // 1 kcal = 4184 J and 1 eV/particle = 96.4853321233100184 kJ/mol (CODATA 2018 e·N_A;
  // NIST SP 811 App. B for the calorie; both as in REFERENCE.md §1).
  it('converts J/mol to the display unit with the chosen decimals', () => {
    expect(formatEnergy(4184 * 12.345, 'kcal/mol', 2)).toBe('12.35');
    expect(formatEnergy(96485.3321233100184, 'eV', 3)).toBe('1.000');
    expect(formatEnergy(-4184 * 3, 'kJ/mol', 1)).toBe('−12.6');
  });

  it('drops the sign of a value that rounds to zero', () => {
    expect(formatEnergy(-1e-9, 'kcal/mol', 1)).toBe('0.0');
    expect(formatEnergy(-0.01, 'kJ/mol', 0)).toBe('0');
  });

  it('shows a dash for an energy that could not be resolved, and never "Infinity"', () => {
    expect(formatEnergy(null, 'kcal/mol', 1)).toBe('—');
    expect(formatEnergy(Number.POSITIVE_INFINITY, 'kcal/mol', 1)).toBe('—');
  });

  it('uses the typographic minus and keeps trailing zeros', () => {
    expect(formatFixed(-0.5, 2)).toBe('−0.50');
    expect(formatFixed(0.06, 2)).toBe('0.06');
  });
});

describe('energyHeading', () => {
  it('names the relative quantity and the unit (IUPAC Green Book quantity/unit form)', () => {
    expect(energyHeading('G', 'kcal/mol')).toBe('ΔG / kcal mol⁻¹');
    expect(energyHeading('E', 'cm-1')).toBe('ΔE / cm⁻¹');
  });
});
