import { describe, expect, it } from 'vitest';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { MM_PER_PT } from '../../../core/figure/scene.ts';
import { OKABE_ITO } from '../../../core/figure/themes.ts';
import { fontMetrics } from './fontFixture.ts';
import { fixture, twoPathways } from './profileFixture.ts';
import type { PointSpec } from './profileFixture.ts';
import { barBoxes, intersects, labelBoxes, paths, textOf, texts } from './sceneQueries.ts';

const metrics = fontMetrics();

describe('layoutFigure', () => {
  it('is deterministic', () => {
    const { doc, profile } = twoPathways();
    expect(layoutFigure(profile, doc, { metrics })).toEqual(layoutFigure(profile, doc, { metrics }));
  });

  it('uses the preset size and the document font size', () => {
    const { doc, profile } = twoPathways({ preset: 'single', fontSizePt: 7 });
    const scene = layoutFigure(profile, doc, { metrics });
    // 85 mm single column: our common-practice preset (see presets.ts).
    expect(scene.widthMm).toBe(85);
    expect(texts(scene, 'label')[0]!.runs[0]!.sizeMm).toBeCloseTo(7 * MM_PER_PT, 12);
    expect(layoutFigure(profile, doc, { metrics, widthMm: 120, heightMm: 70 })).toMatchObject({ widthMm: 120, heightMm: 70 });
  });

  it('draws one bar per known level, shared states at one x', () => {
    const { doc, profile } = twoPathways();
    const scene = layoutFigure(profile, doc, { metrics });
    const bars = paths(scene, 'level');
    expect(bars).toHaveLength(8);
    const centre = (id: string) => {
      const b = bars.find((p) => p.point === id)!.segments as { x: number }[];
      return (b[0]!.x + b[1]!.x) / 2;
    };
    expect(centre('un-0')).toBeCloseTo(centre('cat-0'), 9);
    expect(centre('un-2')).toBeCloseTo(centre('cat-4'), 9);
    expect(centre('un-1')).toBeCloseTo(centre('cat-2'), 9);
  });

  it('puts higher energies higher on the page', () => {
    const { doc, profile } = twoPathways();
    const bars = paths(layoutFigure(profile, doc, { metrics }), 'level');
    const y = (id: string) => (bars.find((p) => p.point === id)!.segments[0] as { y: number }).y;
    expect(y('un-1')).toBeLessThan(y('cat-1'));
    expect(y('cat-1')).toBeLessThan(y('cat-0'));
    expect(y('cat-0')).toBeLessThan(y('cat-2'));
  });

  it('skips unknown energies and breaks the connector there', () => {
    const { doc, profile } = fixture([{ id: 'p', name: 'p', points: [['A', 'min', 0], ['TS', 'ts', null], ['B', 'min', -2], ['C', 'min', -4]] }]);
    const scene = layoutFigure(profile, doc, { metrics });
    expect(paths(scene, 'level')).toHaveLength(3);
    expect(paths(scene, 'connector')).toHaveLength(1);
  });

  it('honours per-point bar width and x', () => {
    const { doc, profile } = fixture([{ id: 'p', name: 'p', points: [['A', 'min', 0], ['B', 'min', 1]] }]);
    doc.pathways[0]!.points[1]!.barWidthMm = 3;
    doc.pathways[0]!.points[1]!.x = 3;
    const bars = paths(layoutFigure(profile, doc, { metrics }), 'level');
    const [b0, b1] = bars[1]!.segments as { x: number }[];
    expect(b1!.x - b0!.x).toBeCloseTo(3, 9);
    const a = bars[0]!.segments as { x: number }[];
    // Slots 0 and 3: the gap between centres is three slot widths.
    const spacing = ((b0!.x + b1!.x) / 2 - (a[0]!.x + a[1]!.x) / 2) / 3;
    expect(spacing).toBeGreaterThan(5);
  });

  it('titles the axis with quantity and unit and labels TS with ‡ when asked', () => {
    const { doc, profile } = twoPathways();
    const scene = layoutFigure(profile, doc, { metrics });
    expect(texts(scene, 'title').map(textOf)).toContain('ΔG / kcal mol⁻¹');
    const labels = texts(scene, 'label').map(textOf);
    expect(labels).toContain('TS1‡');
    expect(labels).toContain('Int1');
    expect(labels).toContain('+14.2');
    expect(labels).toContain('\u221212.4');
    doc.figure.daggerOnTs = false;
    expect(texts(layoutFigure(profile, doc, { metrics }), 'label').map(textOf)).not.toContain('TS1‡');
  });

  it('labels a state shared by pathways once', () => {
    const { doc, profile } = twoPathways();
    const labels = texts(layoutFigure(profile, doc, { metrics }), 'label').map(textOf);
    expect(labels.filter((t) => t === 'A + B')).toHaveLength(1);
  });

  it('keeps the axis ticks round and inside the plot', () => {
    const { doc, profile } = twoPathways();
    const ticks = texts(layoutFigure(profile, doc, { metrics }), 'tick').map(textOf);
    // d3 nice(): extent −12.4…27.6 rounds out to −20…30 in steps of 10.
    expect(ticks).toEqual(['\u221220', '\u221210', '0', '10', '20', '30']);
  });

  it('draws curves as cubic segments flat at both levels', () => {
    const { doc, profile } = twoPathways({ connector: 'curve' });
    for (const c of paths(layoutFigure(profile, doc, { metrics }), 'connector')) {
      const [m, s] = c.segments;
      if (m?.op !== 'M' || s?.op !== 'C') throw new Error('expected M then C');
      expect(s.y1).toBe(m.y);
      expect(s.y2).toBe(s.y);
    }
  });

  it('colours pathways from the Okabe–Ito palette and greyscale pathways by dash and shade', () => {
    const { doc, profile } = twoPathways();
    const colours = new Set(paths(layoutFigure(profile, doc, { metrics }), 'connector').map((p) => p.stroke!.colour));
    expect([...colours].every((c) => (Object.values(OKABE_ITO) as string[]).includes(c))).toBe(true);
    expect(colours.size).toBe(2);
    const grey = paths(layoutFigure(profile, doc, { metrics, theme: 'greyscale' }), 'connector');
    const dashes = new Set(grey.map((p) => JSON.stringify(p.stroke!.dashMm ?? 'solid')));
    expect(dashes.size).toBe(2);
    // Without colour, the levels and labels differ too: black and dark grey (issue 11, rule 5).
    expect(new Set(grey.map((p) => p.stroke!.colour))).toEqual(new Set(['#000000', '#5C5C5C']));
  });

  it('in greyscale tells four pathways apart by dash, shade and bar weight, and the legend shows each as drawn', () => {
    const route = (id: string, ts: number) => ({ id, name: `route ${id}`, points: [['R', 'min', 0], [`T${id}`, 'ts', ts], ['P', 'min', -5]] as PointSpec[] });
    const { doc, profile } = fixture([route('a', 10), route('b', 14), route('c', 18), route('d', 22)], { theme: 'greyscale' });
    const scene = layoutFigure(profile, doc, { metrics });
    const look = (role: 'level' | 'connector' | 'legend', pathway: string) => paths(scene, role).filter((p) => p.pathway === pathway).map((p) => p.stroke!);
    const keys = ['a', 'b', 'c', 'd'].map((id) => {
      const bar = look('level', `${id}`).find((s) => s.widthMm > 0)!;
      const dash = JSON.stringify(look('connector', id)[0]!.dashMm ?? 'solid');
      // The legend's first stroke is its bar sample, the second its connector sample.
      const [legendBar, legendLine] = look('legend', id);
      expect([legendBar!.colour, legendBar!.widthMm]).toEqual([bar.colour, bar.widthMm]);
      expect(JSON.stringify(legendLine!.dashMm ?? 'solid')).toBe(dash);
      return `${dash}|${bar.colour}|${bar.widthMm}`;
    });
    expect(new Set(keys).size).toBe(4);
    expect(new Set(keys.map((k) => k.split('|')[0])).size).toBe(4);
  });

  it('keeps labels off the bars and off each other', () => {
    const { doc, profile } = twoPathways();
    const scene = layoutFigure(profile, doc, { metrics });
    const boxes = labelBoxes(scene);
    const bars = barBoxes(scene);
    boxes.forEach((a, i) => {
      bars.forEach((b) => expect(intersects(a, b)).toBe(false));
      boxes.slice(i + 1).forEach((b) => expect(intersects(a, b)).toBe(false));
    });
  });
});
