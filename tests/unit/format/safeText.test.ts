import { describe, expect, it } from 'vitest';
import { safeText } from '../../../core/format/safeText.ts';

// Character classes from W3C XML 1.0 (5th ed.) §2.2 and Unicode UAX #9 §2.1–2.2.
describe('safeText', () => {
  it('replaces characters XML 1.0 and terminals cannot carry, keeps tab and line breaks', () => {
    expect(safeText('A\u0000B\u001b[31mC\u0007')).toBe('A\uFFFDB\uFFFD[31mC\uFFFD');
    expect(safeText('x\u009b2Jy\u007f')).toBe('x\uFFFD2Jy\uFFFD');
    expect(safeText('a\tb\nc\r\n')).toBe('a\tb\nc\r\n');
    expect(safeText('\uFFFE\uFFFF')).toBe('\uFFFD\uFFFD');
  });

  it('replaces unpaired surrogates and keeps paired ones (emoji, script letters)', () => {
    expect(safeText('a\uD800b\uDC00')).toBe('a\uFFFDb\uFFFD');
    expect(safeText('😀 𝒜')).toBe('😀 𝒜');
  });

  it('drops bidirectional overrides and isolates so a label cannot be shown reversed', () => {
    expect(safeText('\u202ETS1\u202C')).toBe('TS1');
    expect(safeText('\u2067INT\u2069 \u202Ax')).toBe('INT x');
  });

  it('returns ordinary text unchanged (ΔG‡, subscripts, ⇌)', () => {
    const text = 'ΔG‡ = 21.1 kcal mol⁻¹, CO₂ ⇌ LA·AE′';
    expect(safeText(text)).toBe(text);
  });
});
