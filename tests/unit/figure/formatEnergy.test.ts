import { describe, expect, it } from 'vitest';
import { formatEnergy } from '../../../core/figure/formatEnergy.ts';
import { axisTitle } from '../../../core/figure/axisTitle.ts';

describe('formatEnergy', () => {
  it('rounds to the chosen decimals and always shows the sign (U+2212 for minus)', () => {
    expect(formatEnergy(14.25, 1, 'plain', 'kcal/mol')).toBe('+14.3');
    expect(formatEnergy(-3.5, 2, 'plain', 'kcal/mol')).toBe('\u22123.50');
    expect(formatEnergy(7, 0, 'plain', 'kJ/mol')).toBe('+7');
  });

  it('prints no sign on a value that rounds to zero', () => {
    expect(formatEnergy(-0.04, 1, 'plain', 'kcal/mol')).toBe('0.0');
    expect(formatEnergy(0, 1, 'plain', 'kcal/mol')).toBe('0.0');
  });

  it('wraps in parentheses or appends the unit on request', () => {
    expect(formatEnergy(-12.4, 1, 'parentheses', 'kcal/mol')).toBe('(\u221212.4)');
    expect(formatEnergy(21, 1, 'withUnit', 'kJ/mol')).toBe('+21.0 kJ mol⁻¹');
  });
});

describe('axisTitle', () => {
  // Quantity / unit labelling of axes: IUPAC Green Book, 3rd ed. (2007), §1.4 (from memory).
  it('names the relative quantity over its unit', () => {
    expect(axisTitle('G', 'kcal/mol')).toBe('ΔG / kcal mol⁻¹');
    expect(axisTitle('H', 'kJ/mol')).toBe('ΔH / kJ mol⁻¹');
    expect(axisTitle('E', 'eV')).toBe('ΔE / eV');
  });
});
