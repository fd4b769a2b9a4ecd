import { describe, expect, it } from 'vitest';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { sceneToPdf } from '../../../core/export/sceneToPdf.ts';
import { subsetFontNode } from '../../../core/export/subsetFont.node.ts';
import { fontBytes, fontMetrics } from '../figure/fontFixture.ts';
import { fixture } from '../figure/profileFixture.ts';
import { listPdfFonts, pdffontsEmbedded } from './pdfFonts.ts';

const metrics = fontMetrics();
const PT_PER_MM = 72 / 25.4;

function scenario(figure = {}) {
  return fixture([
    { id: 'a', name: 'route A → B at 25 °C', points: [['A', 'min', 0], ['TS1', 'ts', 14.2], ['B', 'min', -12.4]] },
    { id: 'b', name: 'H_2O assisted', points: [['A', 'min', 0], ['TS1', 'ts', 9.1], ['B', 'min', -12.4]] },
  ], figure);
}

async function open(bytes: Uint8Array) {
  // pdf.js (Mozilla's reader) parses our bytes independently of jsPDF.
  const pdf = await getDocument({ data: bytes.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  const page = await pdf.getPage(1);
  const content = await page.getTextContent();
  const text = content.items.map((i) => ('str' in i ? i.str : '')).join('\n');
  const ops = (await page.getOperatorList()).fnArray;
  return { pdf, page, text, ops };
}

describe('sceneToPdf', () => {
  it('prints labels, Δ, ‡, ⁻¹, ° and arrows as extractable text in the embedded font', async () => {
    const { doc, profile } = scenario();
    const bytes = await sceneToPdf(layoutFigure(profile, doc, { metrics }), { fontBytes, subsetFont: subsetFontNode });
    const { text } = await open(bytes);
    for (const s of ['ΔG / kcal mol⁻¹', 'TS1', '‡', '+14.2', '\u221212.4', 'route A → B at 25 °C', 'Reaction coordinate']) {
      expect(text, s).toContain(s);
    }
  });

  it('draws with vector paths and embeds no raster image', async () => {
    const { doc, profile } = scenario();
    const bytes = await sceneToPdf(layoutFigure(profile, doc, { metrics }), { fontBytes, subsetFont: subsetFontNode });
    const { ops } = await open(bytes);
    expect(ops).toContain(OPS.constructPath);
    expect(ops).not.toContain(OPS.paintImageXObject);
    expect(ops).not.toContain(OPS.paintInlineImageXObject);
    expect(new TextDecoder('latin1').decode(bytes)).not.toMatch(/\/Subtype\s*\/Image/);
  });

  it('makes the page the figure size, landscape or portrait as the figure is', { timeout: 30_000 }, async () => {
    const { doc, profile } = scenario({ preset: 'single' });
    const wide = await open(await sceneToPdf(layoutFigure(profile, doc, { metrics }), { fontBytes }));
    const [, , w, h] = wide.page.view as [number, number, number, number];
    expect(w / PT_PER_MM).toBeCloseTo(85, 2);
    expect(h / PT_PER_MM).toBeCloseTo(59.5, 2);
    const tall = await open(await sceneToPdf(layoutFigure(profile, doc, { metrics, widthMm: 60, heightMm: 90 }), { fontBytes }));
    const [, , tw, th] = tall.page.view as [number, number, number, number];
    expect(tw / PT_PER_MM).toBeCloseTo(60, 2);
    expect(th / PT_PER_MM).toBeCloseTo(90, 2);
  });

  it('embeds a much smaller font when subset to the glyphs used', async () => {
    const { doc, profile } = scenario();
    const scene = layoutFigure(profile, doc, { metrics });
    const full = await sceneToPdf(scene, { fontBytes });
    const subset = await sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode });
    expect(subset.length).toBeLessThan(full.length / 3);
    expect((await open(subset)).text).toContain('ΔG / kcal mol⁻¹');
  });

  it('lists only the embedded font (no unembedded standard fonts for a preflight to flag)', async () => {
    const { doc, profile } = scenario();
    for (const subsetFont of [subsetFontNode, undefined]) {
      const bytes = await sceneToPdf(layoutFigure(profile, doc, { metrics }), { fontBytes, ...(subsetFont ? { subsetFont } : {}) });
      const fonts = listPdfFonts(bytes);
      expect(fonts.map((f) => f.name)).toEqual(['DejaVu#20Sans']);
      expect(fonts.every((f) => f.embedded)).toBe(true);
      const poppler = pdffontsEmbedded(bytes);
      if (poppler) expect(poppler).toEqual([true]);
    }
  });
});
