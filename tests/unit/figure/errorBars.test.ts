import { describe, expect, it } from 'vitest';
import { errorBarKey, type ErrorBarRanges } from '../../../core/figure/errorBars.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import type { Box, PathItem, Scene } from '../../../core/figure/scene.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { errorBarRanges } from '../../../core/uncertainty/errorBarRanges.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import type { Document } from '../../../core/model/schema.ts';
import { onePathway, typed } from '../profile/builders.ts';
import { fontMetrics } from './fontFixture.ts';
import { paths, texts } from './sceneQueries.ts';
import { corpusErrorBars, FIGURE_CORPUS } from '../../fixtures/figureCorpus.ts';

/** J/mol per kcal/mol (thermochemical calorie, 4.184 J: ISO 80000-5). */
const kcal = 4184;
const metrics = fontMetrics();
const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20, { energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -5)]);
const profile = resolveProfile(doc);
const layout = (d: Document, bars: ErrorBarRanges, preset: 'single' | 'double' = 'double') => layoutFigure(resolveProfile(d), d, { metrics, preset, errorBars: bars });
const levelY = (scene: Scene, point: string) => (paths(scene, 'level').find((i) => i.point === point)!.segments[0] as { y: number }).y;
const ends = (bar: PathItem) => {
  const [top, bottom] = bar.segments as { x: number; y: number }[];
  return { x: top!.x, top: top!.y, bottom: bottom!.y };
};
/** The energy axis spine: its top and bottom, mm. */
const spine = (scene: Scene) => {
  const ys = paths(scene, 'axis')[0]!.segments.map((s) => (s as { y: number }).y);
  return { top: Math.min(...ys), bottom: Math.max(...ys) };
};

describe('error bars drawn by layoutFigure', () => {
  it('puts the ends of a bar at its energies on the layout\'s own linear scale', () => {
    // TS from 18 to 23 kcal/mol. The levels R (0) and TS (20) fix the scale:
    // y(E) = y(0) + E · (y(20) − y(0)) / 20, so y(23) = y(0) + 1.15 · (y(20) − y(0)) and y(18) = y(0) + 0.9 · (y(20) − y(0)).
    const scene = layout(doc, new Map([[errorBarKey('a', 'TS'), { low: 18 * kcal, high: 23 * kcal }]]));
    const bars = paths(scene, 'errorBar');
    expect(bars).toHaveLength(1);
    const [y0, y20] = [levelY(scene, 'R'), levelY(scene, 'TS')];
    const { top, bottom } = ends(bars[0]!);
    expect(top).toBeCloseTo(y0 + 1.15 * (y20 - y0), 9);
    expect(bottom).toBeCloseTo(y0 + 0.9 * (y20 - y0), 9);
    // The same check from another level: P at −5 lies a quarter of the 0→20 span below R.
    expect(levelY(scene, 'P')).toBeCloseTo(y0 - 0.25 * (y20 - y0), 9);
  });

  it('draws the bar through the level\'s centre in its colour, thinner than the bar, with caps, on the error-bars layer', () => {
    const scene = layout(doc, new Map([[errorBarKey('a', 'TS'), { low: 18 * kcal, high: 23 * kcal }]]));
    const bar = paths(scene, 'errorBar')[0]!;
    const level = paths(scene, 'level').find((i) => i.point === 'TS')!;
    const [a, b] = level.segments as { x: number }[];
    expect(ends(bar).x).toBeCloseTo((a!.x + b!.x) / 2, 9);
    expect(bar.stroke!.colour).toBe(level.stroke!.colour);
    expect(bar.stroke!.widthMm).toBeLessThan(level.stroke!.widthMm);
    expect(bar.segments).toHaveLength(6);
    expect({ pathway: bar.pathway, point: bar.point }).toEqual({ pathway: 'a', point: 'TS' });
    // Drawn above the levels, below the labels (sceneLayers order).
    const at = (i: PathItem) => scene.items.indexOf(i);
    expect(at(bar)).toBeGreaterThan(at(level));
    expect(at(bar)).toBeLessThan(scene.items.findIndex((i) => i.role === 'label'));
  });

  it('no ranges: the same figure as without bars', () => {
    expect(layout(doc, new Map())).toEqual(layoutFigure(profile, doc, { metrics, preset: 'double' }));
  });

  // Wide 95 % bars on a single-column figure: ±25 kcal/mol on a 25 kcal/mol profile.
  const wide = onePathway([typed('R', 'min', 0), typed('TS1', 'ts', 18), typed('I', 'min', 4), typed('TS2', 'ts', 22), typed('P', 'min', -3)]);
  const wideBars: ErrorBarRanges = new Map(['R', 'TS1', 'I', 'TS2', 'P'].map((id, k) => {
    const e = [0, 18, 4, 22, -3][k]!;
    return [errorBarKey('a', id), { low: (e - 25) * kcal, high: (e + 25) * kcal }] as const;
  }));

  it('keeps wide bars inside the plot of an 85 mm figure, on an axis with more than one tick', () => {
    const scene = layout(wide, wideBars, 'single');
    expect(scene.widthMm).toBe(85);
    const bars = paths(scene, 'errorBar');
    expect(bars).toHaveLength(5);
    const axis = spine(scene);
    for (const bar of bars) {
      const { top, bottom } = ends(bar);
      expect(top).toBeGreaterThanOrEqual(axis.top - 1e-9);
      expect(bottom).toBeLessThanOrEqual(axis.bottom + 1e-9);
      expect(top).toBeGreaterThan(0);
      expect(bottom).toBeLessThan(scene.heightMm);
    }
    const ticks = texts(scene, 'tick').map((t) => t.runs.map((r) => r.text).join(''));
    expect(ticks.length).toBeGreaterThanOrEqual(2);
    expect(ticks.some((t) => t !== '0')).toBe(true);
  });

  it('keeps every label clear of every error bar (by geometry)', () => {
    for (const preset of ['single', 'double'] as const) {
      const scene = layout(wide, wideBars, preset);
      const labels = scene.items.filter((i) => i.role === 'label').map((i) => (i.kind === 'text' ? i.box : pathBox(i)));
      expect(labels.length).toBeGreaterThan(0);
      for (const bar of paths(scene, 'errorBar')) {
        for (const piece of straightPieces(bar)) for (const box of labels) expect(overlaps(piece, box), `${bar.point} ${preset}`).toBe(false);
      }
    }
  });
});

describe('leaders of levels with error bars', () => {
  it('start on the bar away from its error bar, never running along it (follow-up: leaders from the bar centre lay on the whisker)', () => {
    let checked = 0;
    for (const e of FIGURE_CORPUS.slice(0, 12)) {
      const scene = layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset: 'single', errorBars: corpusErrorBars(e.doc) });
      const bars = paths(scene, 'errorBar');
      for (const leader of paths(scene, 'leader').filter((l) => l.point !== undefined)) {
        const own = bars.filter((b) => b.pathway === leader.pathway && b.point === leader.point);
        if (own.length === 0) continue;
        checked++;
        const [a] = leader.segments as { x: number }[];
        for (const bar of own) expect(Math.abs(a!.x - ends(bar).x), e.name).toBeGreaterThan(bar.stroke!.widthMm);
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe('errorBarRanges', () => {
  const result = analyseUncertainty(doc, { samples: 20_000, seed: 8 });
  it('±σ bars are the point estimate ± the sample σ (≈ the entered 1 kcal/mol); levels that do not vary get none', () => {
    const bars = errorBarRanges(result, 'sigma');
    const ts = bars.get(errorBarKey('a', 'TS'))!;
    expect((ts.high - ts.low) / 2 / kcal).toBeCloseTo(1, 1);
    expect((ts.high + ts.low) / 2 / kcal).toBeCloseTo(20, 9);
    expect(bars.has(errorBarKey('a', 'R'))).toBe(false);
  });

  it('95 % bars are the 2.5–97.5 % interval (±1.96 σ for a normal)', () => {
    const ts = errorBarRanges(result, 'interval').get(errorBarKey('a', 'TS'))!;
    expect((ts.high - ts.low) / 2 / kcal / 1.959964).toBeCloseTo(1, 1);
  });
});

/** Each straight piece of a path as a box, its stroke included (computed here, not with the code under test). */
function straightPieces(p: PathItem): Box[] {
  const half = p.stroke!.widthMm / 2;
  const out: Box[] = [];
  let at = { x: 0, y: 0 };
  for (const s of p.segments) {
    if (s.op === 'L') {
      const x = Math.min(at.x, s.x);
      const y = Math.min(at.y, s.y);
      out.push({ x: x - half, y: y - half, w: Math.abs(s.x - at.x) + 2 * half, h: Math.abs(s.y - at.y) + 2 * half });
    }
    if (s.op === 'M' || s.op === 'L') at = { x: s.x, y: s.y };
  }
  return out;
}

function pathBox(p: PathItem): Box {
  const xs = p.segments.flatMap((s) => ('x' in s ? [s.x] : []));
  const ys = p.segments.flatMap((s) => ('y' in s ? [s.y] : []));
  return { x: Math.min(...xs), y: Math.min(...ys), w: Math.max(...xs) - Math.min(...xs), h: Math.max(...ys) - Math.min(...ys) };
}

function overlaps(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}
