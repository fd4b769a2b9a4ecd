import { describe, expect, it } from 'vitest';
import * as hb from 'harfbuzzjs';
import { subsetFontNode } from '../../../core/export/subsetFont.node.ts';
import { readFontMetrics } from '../../../core/figure/font/fontMetrics.ts';
import { fontBytes, fontMetrics } from '../figure/fontFixture.ts';

// Reference library: HarfBuzz's own reader (harfbuzzjs's main build, a separate wasm from
// the subsetter) opens the subset independently of our code.
const TEXT = 'ΔG‡ / kcal mol⁻¹ TS1 −12.4 °C → ⇌';

describe('subsetFontNode', () => {
  it('keeps exactly the code points of the text, each with its full-font advance', async () => {
    const subset = await subsetFontNode(fontBytes, TEXT);
    const face = new hb.Face(new hb.Blob(subset));
    const wanted = [...new Set([...TEXT].map((c) => c.codePointAt(0)!))].sort((a, b) => a - b);
    expect([...face.collectUnicodes()].sort((a, b) => a - b)).toEqual(wanted);
    const full = fontMetrics();
    const ours = readFontMetrics(subset);
    for (const cp of wanted) expect(ours.advance(cp), `U+${cp.toString(16)}`).toBe(full.advance(cp));
    expect(ours.unitsPerEm).toBe(full.unitsPerEm);
  });

  it('is a small TrueType file (glyf outlines, not CFF) with the name table jsPDF reads', async () => {
    const subset = await subsetFontNode(fontBytes, TEXT);
    expect(subset.length).toBeLessThan(fontBytes.length / 20);
    expect([...subset.subarray(0, 4)]).toEqual([0, 1, 0, 0]); // sfnt version 1.0 = TrueType outlines (OpenType spec, "Organization of an OpenType font")
    const face = new hb.Face(new hb.Blob(subset));
    expect(face.referenceTable('glyf')?.length).toBeGreaterThan(0);
    expect(face.referenceTable('cmap')?.length).toBeGreaterThan(0);
    expect(face.getName(6, 'en')).toBe('DejaVuSans'); // PostScript name, as in the full font
  });

  it('gives the same bytes when called again in the same process (the wasm heap is reused)', async () => {
    const a = await subsetFontNode(fontBytes, TEXT);
    await subsetFontNode(fontBytes, 'something else entirely 0123456789');
    expect(await subsetFontNode(fontBytes, TEXT)).toEqual(a);
  });

  it('rejects bytes that are not a font', async () => {
    await expect(subsetFontNode(new Uint8Array([1, 2, 3, 4, 5]), 'A')).rejects.toThrow(/subsetFont/);
  });
});
