import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../../core/analysis/analyseDocument.ts';
import { layoutFigure } from '../../../../core/figure/layoutFigure.ts';
import { omittedLabelsMessage } from '../../../../core/figure/omittedLabelsMessage.ts';
import { pathPieces } from '../../../../core/figure/pathPieces.ts';
import type { Box, Scene, SceneItem } from '../../../../core/figure/scene.ts';
import { itemsBox } from '../../../../core/figure/structures/depictionItems.ts';
import { overlaps } from '../../../../core/figure/geometry.ts';
import type { Document } from '../../../../core/model/schema.ts';
import { loadStructureToolkit } from '../../../../core/structure/loadStructureToolkit.ts';
import { pointDepictions } from '../../../../core/structure/pointDepictions.ts';
import { readStructures } from '../../../../core/structure/readStructures.ts';
import { manyStructuresDocument, structuresDocument } from '../../../fixtures/structuresDocument.ts';
import { fontMetrics } from '../fontFixture.ts';

const toolkit = await loadStructureToolkit();
// OpenChemLib's first layout is slow (it starts its templates): do it before the timed tests.
toolkit.read({ format: 'smiles', text: 'c1ccccc1' });
const metrics = fontMetrics();

function layout(doc: Document, options: Partial<Parameters<typeof layoutFigure>[2]> = {}): Scene {
  const table = readStructures(doc, toolkit);
  return layoutFigure(analyseDocument(doc, table).profile, doc, { metrics, structures: pointDepictions(doc, table), ...options });
}

function drawingBoxes(scene: Scene): Map<string, Box> {
  const groups = new Map<string, SceneItem[]>();
  for (const item of scene.items) if (item.role === 'structure') groups.set(item.group!, [...(groups.get(item.group!) ?? []), item]);
  return new Map([...groups].map(([g, items]) => [g, itemsBox(items as never, 0)]));
}

/** Boxes of everything a drawing must not cover: bars, connector pieces, every other text. */
function obstacles(scene: Scene): Box[] {
  const out: Box[] = [];
  for (const item of scene.items) {
    if (item.role === 'structure' || item.role === 'background') continue;
    if (item.kind === 'text') out.push(item.box);
    else if (item.role === 'level' || item.role === 'connector' || item.role === 'arrow' || item.role === 'leader') out.push(...pathPieces(item.segments, (item.stroke?.widthMm ?? 0) / 2, 32));
  }
  return out;
}

function collisions(scene: Scene): string[] {
  const found: string[] = [];
  const boxes = drawingBoxes(scene);
  const page = { x: 0, y: 0, w: scene.widthMm, h: scene.heightMm };
  const others = obstacles(scene);
  for (const [name, box] of boxes) {
    if (box.x < page.x || box.y < page.y || box.x + box.w > page.w || box.y + box.h > page.h) found.push(`${name} off the page`);
    if (others.some((o) => overlaps(box, o))) found.push(`${name} covers a level, connector or label`);
    for (const [other, b] of boxes) if (other > name && overlaps(box, b)) found.push(`${name} overlaps ${other}`);
  }
  return found;
}

// The toolkit's layouts take seconds on a busy machine.
describe('placeStructures (through layoutFigure)', { timeout: 30_000 }, () => {
  const corpus: [string, Document][] = [['ester hydrolysis', structuresDocument()], ['20 states', manyStructuresDocument(20)], ['2 pathways × 8 states', manyStructuresDocument(8, 2)]];
  for (const [name, doc] of corpus) {
    for (const preset of ['single', 'double', 'slide'] as const) {
      it(`${name}, ${preset}: every drawing is placed or listed, and none covers anything`, () => {
        const scene = layout(doc, { preset });
        expect(collisions(scene)).toEqual([]);
        const points = doc.pathways.reduce((n, p) => n + p.points.length, 0);
        const left = scene.omittedLabels.filter((o) => o.kind === 'structure').length;
        expect(drawingBoxes(scene).size + left).toBe(points);
      });
    }
  }

  it('draws every structure of the ester hydrolysis in the single-column preset', () => {
    expect(drawingBoxes(layout(structuresDocument(), { preset: 'single' })).size).toBe(6);
  });

  it('grows a preset figure to make room, and keeps a height the user set', () => {
    const doc = structuresDocument();
    const plain = layoutFigure(analyseDocument(doc).profile, doc, { metrics, preset: 'single' });
    expect(layout(doc, { preset: 'single' }).heightMm).toBeGreaterThan(plain.heightMm);
    expect(layout(doc, { preset: 'single', heightMm: 50 }).heightMm).toBe(50);
  });

  it('tells the user which drawings found no room', () => {
    const scene = layout(manyStructuresDocument(20), { preset: 'single', heightMm: 30 });
    const left = scene.omittedLabels.filter((o) => o.kind === 'structure');
    expect(left.length).toBeGreaterThan(0);
    expect(omittedLabelsMessage(left)).toMatch(/the structure of "(I|TS)\d+" \(pathway 1\)/);
    expect(collisions(scene)).toEqual([]);
  });

  it('draws in the theme’s ink, bonds scaled with the figure line width', () => {
    const doc = structuresDocument();
    for (const [theme, ink] of [['greyscale', '#000000'], ['dark', '#EDEDED']] as const) {
      const colours = new Set(layout(doc, { theme }).items.filter((i) => i.role === 'structure').map((i) => (i.kind === 'text' ? i.colour : i.stroke?.colour ?? i.fill)));
      expect([...colours]).toEqual([ink]);
    }
    const width = (d: Document) => layout(d).items.find((i) => i.role === 'structure' && i.kind === 'path' && i.stroke)!;
    const thick = structuresDocument();
    thick.figure.lineWidthPt = 2;
    const w1 = width(doc), w2 = width(thick);
    if (w1.kind !== 'path' || w2.kind !== 'path') throw new Error('expected paths');
    expect(w2.stroke!.widthMm).toBeCloseTo(2 * w1.stroke!.widthMm, 9);
  });

  it('draws the marked forming bond dashed and keeps ‡ on the label, not in the drawing', () => {
    const scene = layout(structuresDocument());
    const ts1 = scene.items.filter((i) => i.point === 'ts1' && i.role === 'structure');
    expect(ts1.some((i) => i.kind === 'path' && i.stroke?.dashMm)).toBe(true);
    expect(ts1.some((i) => i.kind === 'text' && i.runs.some((r) => r.text.includes('‡')))).toBe(false);
    expect(scene.items.some((i) => i.point === 'ts1' && i.role === 'label' && i.kind === 'text' && i.runs.some((r) => r.text.includes('‡')))).toBe(true);
  });

  it('puts a drawing below its level when the point asks for it', () => {
    const doc = structuresDocument();
    doc.pathways[0]!.points[2]!.moleculeSide = 'below';
    const scene = layout(doc);
    const bar = scene.items.find((i) => i.role === 'level' && i.point === 'int')!;
    if (bar.kind !== 'path' || bar.segments[0]!.op !== 'M') throw new Error('expected a bar');
    expect(drawingBoxes(scene).get('structure a int')!.y).toBeGreaterThan(bar.segments[0]!.y);
  });

  it('leaves a document without structures exactly as before', () => {
    const doc = structuresDocument();
    const profile = analyseDocument(doc).profile;
    expect(layoutFigure(profile, doc, { metrics, structures: new Map() })).toEqual(layoutFigure(profile, doc, { metrics }));
  });
});
