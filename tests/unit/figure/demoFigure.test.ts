import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseDocument } from '../../../core/model/load.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { fontMetrics } from './fontFixture.ts';
import { barBoxes, intersects, labelBoxes, paths } from './sceneQueries.ts';
import { auditCounts, auditScene } from '../../../core/figure/audit/auditScene.ts';
import { errorBarKey } from '../../../core/figure/errorBars.ts';

const text = readFileSync(new URL('../../../assets/demo/demo.passline', import.meta.url), 'utf8');

describe('the demo figure', () => {
  const loaded = parseDocument(text);
  if (!loaded.ok) throw new Error(JSON.stringify(loaded.errors));
  const profile = resolveProfile(loaded.doc);

  for (const preset of ['single', 'double', 'slide'] as const) {
    for (const connector of ['dashed', 'curve'] as const) {
      it(`draws every label, clear of bars and each other (${preset}, ${connector})`, () => {
        const doc = { ...loaded.doc, figure: { ...loaded.doc.figure, connector } };
        const scene = layoutFigure(profile, doc, { metrics: fontMetrics(), preset });
        expect(paths(scene, 'level').length).toBeGreaterThan(0);
        // The demo has room for every label in every preset.
        expect(scene.omittedLabels).toEqual([]);
        const boxes = labelBoxes(scene);
        const bars = barBoxes(scene);
        boxes.forEach((a, i) => {
          for (const b of bars) expect(intersects(a, b)).toBe(false);
          for (const b of boxes.slice(i + 1)) expect(intersects(a, b)).toBe(false);
          // Every label stays on the page.
          expect(a.x >= 0 && a.y >= 0 && a.x + a.w <= scene.widthMm && a.y + a.h <= scene.heightMm).toBe(true);
        });
      });
    }
  }

  for (const preset of ['single', 'double', 'slide'] as const) {
    for (const theme of ['colour', 'greyscale', 'dark'] as const) {
      it(`passes the geometry audit with nothing to fix (${preset}, ${theme})`, () => {
        const scene = layoutFigure(profile, loaded.doc, { metrics: fontMetrics(), preset, theme });
        expect(auditCounts(auditScene(scene))).toEqual({ crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 });
        expect(scene.omittedLabels).toEqual([]);
      });
    }
  }

  // Bars of ±2 kcal/mol (a typical method σ, common practice) and ±3.92 (its 95 % interval,
  // 1.959964 σ) on every level: an 85 mm figure (the demo's own preset) still has room for every label, and
  // the audit finds nothing (the last level's stacked label used to be left out).
  const kcal = 4184; // J/mol per kcal/mol (thermochemical calorie, ISO 80000-5)
  for (const half of [2, 3.92]) {
    it(`with ±${half} kcal/mol error bars on every level, draws every label at 85 mm and audits clean`, () => {
      const errorBars = new Map(profile.pathways.flatMap((p) => p.points.flatMap((q) =>
        q.energyJ === null ? [] : [[errorBarKey(p.id, q.id), { low: q.energyJ - half * kcal, high: q.energyJ + half * kcal }] as const])));
      const scene = layoutFigure(profile, loaded.doc, { metrics: fontMetrics(), widthMm: 85, errorBars });
      expect(paths(scene, 'errorBar')).toHaveLength(paths(scene, 'level').length);
      expect(scene.omittedLabels).toEqual([]);
      expect(auditCounts(auditScene(scene))).toEqual({ crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 });
    });
  }
});
