import { describe, expect, it } from 'vitest';
import * as hb from 'harfbuzzjs';
import { readFontMetrics } from '../../../../core/figure/font/fontMetrics.ts';
import { measureText } from '../../../../core/figure/font/measureText.ts';
import { fontBytes, fontMetrics } from '../fontFixture.ts';

// Reference library: HarfBuzz (harfbuzzjs, a dependency for font subsetting) reads the same
// file independently; our advances and em size must match its nominal-glyph advances.
const face = new hb.Face(new hb.Blob(fontBytes));
const font = new hb.Font(face);

const SAMPLE = 'AaTS1+ (H₂O) ΔG‡ kcal mol⁻¹ ° → ⇌ −12.3 αβγ'.split('').map((c) => c.codePointAt(0)!);

describe('readFontMetrics', () => {
  it('reads unitsPerEm and the hhea ascender/descender as HarfBuzz does', () => {
    const m = fontMetrics();
    expect(m.unitsPerEm).toBe(face.upem);
    const ext = font.hExtents();
    expect(m.ascent * m.unitsPerEm).toBe(ext.ascender);
    expect(m.descent * m.unitsPerEm).toBe(-ext.descender);
  });

  it('maps every sample code point to the glyph advance HarfBuzz reports', () => {
    const m = fontMetrics();
    for (const cp of SAMPLE) {
      const gid = font.nominalGlyph(cp);
      expect(gid, `U+${cp.toString(16)}`).toBeDefined();
      expect(m.has(cp)).toBe(true);
      expect(Math.round(m.advance(cp) * m.unitsPerEm)).toBe(font.glyphHAdvance(gid!));
    }
  });

  it('agrees with HarfBuzz on a scan of the whole Basic Multilingual Plane', () => {
    const m = fontMetrics();
    let checked = 0;
    for (let cp = 0x20; cp < 0xfffe; cp += 7) {
      const gid = font.nominalGlyph(cp);
      expect(m.has(cp)).toBe(gid !== undefined && gid !== 0);
      if (gid) {
        expect(Math.round(m.advance(cp) * m.unitsPerEm)).toBe(font.glyphHAdvance(gid));
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(500);
  });

  it('gives unmapped code points the .notdef advance', () => {
    const m = fontMetrics();
    expect(m.has(0xe000)).toBe(false);
    expect(Math.round(m.advance(0xe000) * m.unitsPerEm)).toBe(font.glyphHAdvance(0));
  });

  it('refuses bytes that are not a font', () => {
    expect(() => readFontMetrics(new TextEncoder().encode('not a font at all, sorry'))).toThrow(/not a TrueType/);
  });
});

describe('measureText', () => {
  it('sums advances scaled to the size (no kerning)', () => {
    const m = fontMetrics();
    const expected = [...'ΔG‡'].reduce((s, c) => s + font.glyphHAdvance(font.nominalGlyph(c.codePointAt(0)!)!), 0) / face.upem * 3;
    expect(measureText(m, 'ΔG‡', 3)).toBeCloseTo(expected, 12);
  });
});
