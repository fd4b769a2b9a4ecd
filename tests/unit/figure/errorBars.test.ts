import { describe, expect, it } from 'vitest';
import { addErrorBars, errorBarKey } from '../../../core/figure/errorBars.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import type { PathItem } from '../../../core/figure/scene.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { errorBarRanges } from '../../../core/uncertainty/errorBarRanges.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { onePathway, typed } from '../profile/builders.ts';
import { fontMetrics } from './fontFixture.ts';

const kcal = 4184;
const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20, { energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -5)]);
const profile = resolveProfile(doc);
const scene = layoutFigure(profile, doc, { metrics: fontMetrics() });
const barY = (point: string) => ((scene.items.find((i) => i.kind === 'path' && i.role === 'level' && i.point === point) as PathItem).segments[0] as { y: number }).y;

describe('addErrorBars', () => {
  it('draws a whisker at the level whose ends sit where those energies would be drawn', () => {
    // A bar on R from −5 to +20 kcal/mol must end exactly at the levels of P and TS (the scale is linear).
    const out = addErrorBars(scene, profile, new Map([[errorBarKey('a', 'R'), { low: -5 * kcal, high: 20 * kcal }]]));
    const whiskers = out.items.filter((i): i is PathItem => i.kind === 'path' && i.role === 'errorBar');
    expect(whiskers).toHaveLength(1);
    const [top, bottom] = whiskers[0]!.segments as { y: number }[];
    expect(top!.y).toBeCloseTo(barY('TS'), 9);
    expect(bottom!.y).toBeCloseTo(barY('P'), 9);
    expect(out.items).toHaveLength(scene.items.length + 1);
  });

  it('no ranges: the same scene', () => {
    expect(addErrorBars(scene, profile, new Map())).toBe(scene);
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
