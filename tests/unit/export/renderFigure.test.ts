import { describe, expect, it } from 'vitest';
import { renderFigure as renderPure, checkRenderOptions } from '../../../core/export/renderFigure.ts';
import { renderFigure } from '../../../core/export/renderFigure.node.ts';
import { svgToPng } from '../../../core/export/png.node.ts';
import { fontBytes } from '../figure/fontFixture.ts';
import { twoPathways } from '../figure/profileFixture.ts';

/** Width and height from a PNG's IHDR chunk (PNG spec, ISO/IEC 15948 §11.2.2). */
function pngSize(bytes: Uint8Array): { w: number; h: number } {
  expect([...bytes.slice(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  const view = new DataView(bytes.buffer, bytes.byteOffset);
  return { w: view.getUint32(16), h: view.getUint32(20) };
}

describe('renderFigure', () => {
  it('returns SVG text, PDF bytes and PNG bytes', async () => {
    const { doc, profile } = twoPathways();
    const svg = await renderFigure(profile, doc, { format: 'svg', fontBytes });
    expect(typeof svg === 'string' && svg.startsWith('<?xml')).toBe(true);
    const pdf = await renderFigure(profile, doc, { format: 'pdf', fontBytes });
    expect(new TextDecoder().decode((pdf as Uint8Array).slice(0, 5))).toBe('%PDF-');
    const png = (await renderFigure(profile, doc, { format: 'png', fontBytes, preset: 'single', dpi: 300 })) as Uint8Array;
    // 85 mm at 300 dpi: 85 / 25.4 × 300 = 1003.9 → 1004 px.
    expect(pngSize(png).w).toBe(1004);
  });

  it('applies width, preset and theme overrides', async () => {
    const { doc, profile } = twoPathways();
    const svg = (await renderFigure(profile, doc, { format: 'svg', fontBytes, widthMm: 120, theme: 'dark' })) as string;
    expect(svg).toContain('width="120mm"');
    expect(svg).toContain('fill="#16181D"');
    const slide = (await renderFigure(profile, doc, { format: 'svg', fontBytes, preset: 'slide' })) as string;
    expect(slide).toContain('viewBox="0 0 254 142.875"');
  });

  it('names a bad option and refuses PNG without a rasteriser', async () => {
    expect(checkRenderOptions({ dpi: 0 })).toBe('dpi: resolution 0 dpi is outside 36 to 2400 dpi');
    expect(checkRenderOptions({ widthMm: -5 })).toBe('width: figure size -5 mm is outside 20 to 2000 mm');
    expect(checkRenderOptions({ dpi: 600, widthMm: 85 })).toBeNull();
    const { doc, profile } = twoPathways();
    await expect(renderPure(profile, doc, { format: 'png', fontBytes })).rejects.toThrow(/rasteriser/);
  });
});

describe('svgToPng', () => {
  it('renders text with the bundled font (text changes the pixels)', async () => {
    const { doc, profile } = twoPathways();
    const svg = (await renderFigure(profile, doc, { format: 'svg', fontBytes })) as string;
    const withText = svgToPng(svg, 175, 150);
    const withoutText = svgToPng(svg.replace(/<text[\s\S]*?<\/text>/g, ''), 175, 150);
    expect(pngSize(withText)).toEqual(pngSize(withoutText));
    expect(Buffer.from(withText).equals(Buffer.from(withoutText))).toBe(false);
    expect(withText.length).toBeGreaterThan(withoutText.length);
  });
});
