import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { Resvg } from '@resvg/resvg-js';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { BUNDLED_FONT_FILE } from '../../../core/export/png.node.ts';
import { sceneToPdf } from '../../../core/export/sceneToPdf.ts';
import { sceneToSvg } from '../../../core/export/sceneToSvg.ts';
import { subsetFontNode } from '../../../core/export/subsetFont.node.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import type { Scene } from '../../../core/figure/scene.ts';
import { itemsBox } from '../../../core/figure/structures/depictionItems.ts';
import { loadStructureToolkit } from '../../../core/structure/loadStructureToolkit.ts';
import { pointDepictions } from '../../../core/structure/pointDepictions.ts';
import { readStructures } from '../../../core/structure/readStructures.ts';
import { structuresDocument } from '../../fixtures/structuresDocument.ts';
import { fontBytes, fontMetrics } from '../figure/fontFixture.ts';

const { JSDOM } = createRequire(import.meta.url)('jsdom') as { JSDOM: new (html: string) => { window: { DOMParser: typeof DOMParser } } };
const { window } = new JSDOM('');

const doc = structuresDocument();
const table = readStructures(doc, await loadStructureToolkit());
const scene = layoutFigure(analyseDocument(doc, table).profile, doc, { metrics: fontMetrics(), preset: 'single', structures: pointDepictions(doc, table) });
const POINTS = ['r', 'ts1', 'int', 'ts2', 'p1', 'p2'];

// PDF writing, rasterising and the toolkit's first layouts take seconds on a busy machine.
describe('exports of a figure with structures', { timeout: 30_000 }, () => {
  it('SVG: well-formed XML with each drawing’s paths and labels in a named group per point', () => {
    const xml = new window.DOMParser().parseFromString(sceneToSvg(scene), 'image/svg+xml');
    expect(xml.getElementsByTagName('parsererror')).toHaveLength(0);
    for (const point of POINTS) {
      const group = xml.getElementById(`structure-a-${point}`);
      expect(group, point).not.toBeNull();
      expect(group!.getAttribute('data-point')).toBe(point);
      expect(group!.getElementsByTagName('path').length, point).toBeGreaterThan(0);
    }
    const ts1 = xml.getElementById('structure-a-ts1')!;
    expect([...ts1.getElementsByTagName('path')].some((p) => p.hasAttribute('stroke-dasharray'))).toBe(true);
    expect([...ts1.getElementsByTagName('tspan')].map((t) => t.textContent)).toContain('O');
    expect(xml.getElementsByTagName('image')).toHaveLength(0);
  });

  it('PDF: vector paths and the atom labels as text, no image', async () => {
    const bytes = await sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode });
    const pdf = await getDocument({ data: bytes.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
    const page = await pdf.getPage(1);
    const text = (await page.getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join('\n');
    for (const label of ['HO', 'OH', 'O']) expect(text, label).toContain(label);
    const ops = (await page.getOperatorList()).fnArray;
    expect(ops).not.toContain(OPS.paintImageXObject);
    expect(ops).not.toContain(OPS.paintInlineImageXObject);
  });

  it('PNG: ink where each drawing is, and none there once the drawings are removed', () => {
    const dpi = 200;
    const raster = (s: Scene) => new Resvg(sceneToSvg(s), { font: { fontFiles: [BUNDLED_FONT_FILE], loadSystemFonts: false, defaultFontFamily: 'DejaVu Sans' }, fitTo: { mode: 'width', value: Math.round((s.widthMm / 25.4) * dpi) } }).render();
    const withDrawings = raster(scene);
    const without = raster({ ...scene, items: scene.items.filter((i) => i.role !== 'structure') });
    const px = withDrawings.width / scene.widthMm;
    const inkIn = (image: ReturnType<typeof raster>, point: string) => {
      const box = itemsBox(scene.items.filter((i) => i.role === 'structure' && i.point === point) as never, 0);
      let ink = 0;
      // resvg hands out a fresh copy of the pixels on every read of `pixels`: read once.
      const pixels = image.pixels;
      for (let y = Math.floor(box.y * px); y < Math.ceil((box.y + box.h) * px); y++) {
        for (let x = Math.floor(box.x * px); x < Math.ceil((box.x + box.w) * px); x++) {
          const k = 4 * (y * image.width + x);
          if (pixels[k]! < 128 && pixels[k + 3]! > 128) ink++;
        }
      }
      return ink;
    };
    for (const point of POINTS) {
      expect(inkIn(withDrawings, point), point).toBeGreaterThan(50);
      expect(inkIn(without, point), point).toBe(0);
    }
  });
});
