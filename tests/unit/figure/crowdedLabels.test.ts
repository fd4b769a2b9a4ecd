import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { fontMetrics } from './fontFixture.ts';
import { fixture, type PathwaySpec } from './profileFixture.ts';
import { barBoxes, intersects, labelBoxes } from './sceneQueries.ts';

const metrics = fontMetrics();

/** Several pathways with the same labels at the same slots and energies within ±1 kcal/mol. */
const crowded = fc.record({
  pathways: fc.integer({ min: 2, max: 6 }),
  points: fc.integer({ min: 2, max: 9 }),
  base: fc.array(fc.double({ min: -30, max: 30, noNaN: true }), { minLength: 9, maxLength: 9 }),
  noise: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 54, maxLength: 54 }),
  preset: fc.constantFrom('single' as const, 'double' as const, 'slide' as const),
  connector: fc.constantFrom('dashed' as const, 'curve' as const),
  decimals: fc.integer({ min: 0, max: 3 }),
});

describe('label placement on crowded profiles', () => {
  it('never lets label boxes overlap each other or any bar, nor leave the page', { timeout: 60_000 }, () => {
    fc.assert(fc.property(crowded, (c) => {
      const specs: PathwaySpec[] = Array.from({ length: c.pathways }, (_, p) => ({
        id: `p${p}`, name: `route ${p}`,
        points: Array.from({ length: c.points }, (_, i) => [i % 2 ? `TS${i}` : `I${i}`, i % 2 ? 'ts' : 'min', c.base[i]! + c.noise[p * 9 + i]!] as const).map((x) => [...x]),
      })) as PathwaySpec[];
      const { doc, profile } = fixture(specs, { preset: c.preset, connector: c.connector }, 'kcal/mol', c.decimals);
      const scene = layoutFigure(profile, doc, { metrics });
      const boxes = labelBoxes(scene);
      const bars = barBoxes(scene);
      for (let i = 0; i < boxes.length; i++) {
        const a = boxes[i]!;
        if (a.x < 0 || a.y < 0 || a.x + a.w > scene.widthMm || a.y + a.h > scene.heightMm) return false;
        for (const b of bars) if (intersects(boxes[i]!, b)) return false;
        for (let j = i + 1; j < boxes.length; j++) if (intersects(boxes[i]!, boxes[j]!)) return false;
      }
      return boxes.length > 0;
    }), { numRuns: 120 });
  });
});
