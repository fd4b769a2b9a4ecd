import { describe, expect, it } from 'vitest';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import type { Figure } from '../../../core/model/schema.ts';
import type { Scene } from '../../../core/figure/scene.ts';
import { fontMetrics } from './fontFixture.ts';
import { fixture, type PathwaySpec } from './profileFixture.ts';
import { barBoxes, intersects, labelBoxes, paths, texts, textOf } from './sceneQueries.ts';

const metrics = fontMetrics();

/**
 * The invented 10 pathways × 50 points zig-zag of tests/bench/figureBench.ts (kcal/mol):
 * far more labels than a page holds. Printed with 3 decimals, so no two pathways share a
 * printed energy at a slot and every point gets its own label (no twins drawn as one).
 */
function crowded(figure: Partial<Figure> = {}) {
  const specs: PathwaySpec[] = Array.from({ length: 10 }, (_, p) => ({
    id: `p${p}`, name: `pathway ${p + 1}`,
    points: Array.from({ length: 50 }, (_, i) => [i % 2 ? `TS${i}` : `I${i}`, i % 2 ? 'ts' : 'min', (i % 2 ? 15 : -2) + 6 * Math.sin(i * 0.7 + p) + p * 0.3]),
  })) as PathwaySpec[];
  return fixture(specs, { preset: 'double', ...figure }, 'kcal/mol', 3);
}

/** Label blocks keyed by "pathway/point" (the key labelBoxes groups by). */
function drawnLabels(scene: Scene): Map<string, ReturnType<typeof labelBoxes>[number]> {
  const keys = [...new Set(texts(scene, 'label').map((t) => `${t.pathway}/${t.point}`))];
  const boxes = labelBoxes(scene);
  return new Map(keys.map((k, i) => [k, boxes[i]!]));
}

const omittedKeys = (scene: Scene) => scene.omittedLabels.flatMap((o) => (o.kind === 'level' ? [`${o.pathway}/${o.point}`] : []));

describe('labels that find no room', () => {
  for (const preset of ['single', 'double', 'slide'] as const) {
    it(`are left out of a crowded figure, and every drawn one sits on the page clear of the rest (${preset})`, () => {
      const { doc, profile } = crowded({ preset });
      const scene = layoutFigure(profile, doc, { metrics });
      const boxes = labelBoxes(scene);
      const bars = barBoxes(scene);
      expect(scene.omittedLabels.length).toBeGreaterThan(0);
      boxes.forEach((a, i) => {
        expect(a.x >= 0 && a.y >= 0 && a.x + a.w <= scene.widthMm && a.y + a.h <= scene.heightMm).toBe(true);
        for (const b of bars) expect(intersects(a, b)).toBe(false);
        for (const b of boxes.slice(i + 1)) expect(intersects(a, b)).toBe(false);
      });
      // Each of the 500 labels is drawn or listed, never both.
      const drawn = [...drawnLabels(scene).keys()];
      const omitted = omittedKeys(scene);
      expect(new Set([...drawn, ...omitted]).size).toBe(500);
      expect(drawn.length + omitted.length).toBe(500);
    });
  }

  it('draws no leader line for a label it leaves out, and names it as the user does', () => {
    const { doc, profile } = crowded();
    const scene = layoutFigure(profile, doc, { metrics });
    const omitted = new Set(omittedKeys(scene));
    expect(paths(scene, 'leader').filter((l) => omitted.has(`${l.pathway}/${l.point}`))).toEqual([]);
    for (const o of scene.omittedLabels) {
      if (o.kind !== 'level') continue;
      const pathway = doc.pathways.find((p) => p.id === o.pathway)!;
      expect(o.pathwayName).toBe(pathway.name);
      expect(o.label).toBe(pathway.points.find((q) => q.id === o.point)!.label);
    }
  });

  it('leaves out the same labels every time', () => {
    const first = crowded();
    const again = crowded();
    const a = layoutFigure(first.profile, first.doc, { metrics });
    const b = layoutFigure(again.profile, again.doc, { metrics });
    expect(b.omittedLabels).toEqual(a.omittedLabels);
    expect(b.items).toEqual(a.items);
  });

  it('lists an annotation label it cannot place by its annotation, and draws none of its text', () => {
    // 40 mm tall: no clear spot is left anywhere for the arrow's label.
    const { doc, profile } = crowded({ preset: 'single', heightMm: 40, annotations: [{ type: 'barrier', pathway: 'p3', from: 'p3-20', to: 'p3-21' }] });
    const scene = layoutFigure(profile, doc, { metrics });
    const listed = scene.omittedLabels.filter((o) => o.kind === 'annotation');
    expect(listed).toEqual([{ kind: 'annotation', annotation: 0, pathway: 'p3', pathwayName: 'pathway 4', text: expect.stringMatching(/^ΔG‡ = \d+\.\d{3}$/) }]);
    expect(texts(scene, 'annotation').map(textOf)).toEqual([]);
    // The arrow itself is still drawn: only its label lacked room.
    expect(paths(scene, 'annotation').length).toBeGreaterThan(0);
  });

  it('never leaves out a label the user placed by hand, and draws it exactly where they put it, even off the page', () => {
    const base = crowded();
    const victim = layoutFigure(base.profile, base.doc, { metrics }).omittedLabels.find((o) => o.kind === 'level')!;
    const offsetBy = (dy: number) => {
      const { doc, profile } = crowded();
      const point = doc.pathways.find((p) => p.id === victim.pathway)!.points.find((q) => q.id === (victim.kind === 'level' ? victim.point : ''))!;
      point.labelOffsetMm = { dx: 3, dy };
      return layoutFigure(profile, doc, { metrics });
    };
    const key = `${victim.pathway}/${victim.kind === 'level' ? victim.point : ''}`;
    const near = offsetBy(-5);
    const far = offsetBy(-500);
    for (const scene of [near, far]) {
      expect(omittedKeys(scene)).not.toContain(key);
      expect(drawnLabels(scene).has(key)).toBe(true);
    }
    const [a, b] = [drawnLabels(near).get(key)!, drawnLabels(far).get(key)!];
    expect(b.x).toBeCloseTo(a.x, 9);
    expect(b.y - a.y).toBeCloseTo(-495, 9);
    expect(b.y).toBeLessThan(0);
  });
});
