import { describe, expect, it } from 'vitest';
import { formatScientific } from '../../../core/format/formatScientific.ts';

// Notation only (no science): three significant figures, × 10 with superscript exponents
// outside 0.01–10 000 (our choice), a true minus sign, "—" where there is no number.
describe('formatScientific', () => {
  it('writes large and small magnitudes with a power of ten', () => {
    expect(formatScientific(1.5123e12)).toBe('1.51 × 10¹²');
    expect(formatScientific(3.2149e-5)).toBe('3.21 × 10⁻⁵');
    expect(formatScientific(-6.97e7)).toBe('−6.97 × 10⁷');
  });

  it('writes the middle range plainly, and no number as a dash', () => {
    expect(formatScientific(0.013588)).toBe('0.0136');
    expect(formatScientific(721.4)).toBe('721');
    expect(formatScientific(0)).toBe('0');
    expect(formatScientific(null)).toBe('—');
    expect(formatScientific(Number.NaN)).toBe('—');
  });

  it('keeps significant trailing zeros and the true minus in the middle range', () => {
    expect(formatScientific(0.06)).toBe('0.0600');
    expect(formatScientific(2)).toBe('2.00');
    expect(formatScientific(-4.5)).toBe('−4.50');
    expect(formatScientific(1234.5)).toBe('1230');
  });
});
