import { describe, expect, it } from 'vitest';
import { auditCounts, auditScene } from '../../../core/figure/audit/auditScene.ts';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { corpusErrorBars, FIGURE_CORPUS } from '../../fixtures/figureCorpus.ts';
import { fontMetrics } from './fontFixture.ts';

const metrics = fontMetrics();
const ZERO = { crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 };

describe('the figure corpus (issue 11)', () => {
  it('holds at least 30 invented documents of 2–4 pathways', () => {
    expect(FIGURE_CORPUS.length).toBeGreaterThanOrEqual(30);
    for (const e of FIGURE_CORPUS) expect(e.doc.pathways.length, e.name).toBeGreaterThanOrEqual(2);
    for (const e of FIGURE_CORPUS) expect(e.doc.pathways.length, e.name).toBeLessThanOrEqual(4);
    expect(FIGURE_CORPUS.some((e) => e.doc.pathways.some((p) => p.cycle))).toBe(true);
  });

  it('keeps the stacks of long labels by their bars at 85 mm, or leads them there (follow-up: two-line stacks sat 5 mm off with no leader)', () => {
    const e = FIGURE_CORPUS.find((c) => c.name === 'long and rich-text labels')!;
    const scene = layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset: 'single' });
    expect(auditScene(scene).misread.map((f) => f.detail)).toEqual([]);
    const stacks = new Set(scene.items.flatMap((i) => (i.kind === 'text' && i.block?.startsWith('stack/') ? [i.block] : [])));
    expect(stacks.size).toBe(2);
  });

  it('leaves the plot room for a four-line stack of close transition states at 85 mm instead of leaving its labels out (follow-up: all four were left out)', () => {
    const e = FIGURE_CORPUS.find((c) => c.name === '4 pathways × 3 points, shared slots within 3 kcal/mol, range 3')!;
    const scene = layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset: 'single' });
    expect(scene.omittedLabels).toEqual([]);
    expect(auditCounts(auditScene(scene))).toEqual(ZERO);
  });

  for (const preset of ['single', 'double', 'slide'] as const) {
    for (const theme of ['colour', 'greyscale', 'dark'] as const) {
      it(`audits clean in every document (${preset}, ${theme})`, { timeout: 60_000 }, () => {
        for (const e of FIGURE_CORPUS) {
          const scene = layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset, theme });
          const audit = auditScene(scene);
          const faults = [...audit.crossings, ...audit.overlaps, ...audit.misread, ...audit.offPage, ...audit.legendOverContent].map((f) => f.detail);
          expect({ ...auditCounts(audit), faults: faults.slice(0, 5) }, e.name).toEqual({ ...ZERO, faults: [] });
        }
      });
    }
    // Greyscale draws some pathways with heavier bars; the dark theme changes colours only.
    for (const theme of ['colour', 'greyscale'] as const) {
      it(`audits clean with error bars on every level in every document (${preset}, ${theme})`, { timeout: 60_000 }, () => {
        for (const e of FIGURE_CORPUS) {
          const bars = corpusErrorBars(e.doc);
          const scene = layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset, theme, errorBars: bars });
          expect(scene.items.filter((i) => i.role === 'errorBar').length, e.name).toBe(bars.size);
          const audit = auditScene(scene);
          const faults = [...audit.crossings, ...audit.overlaps, ...audit.misread, ...audit.offPage, ...audit.legendOverContent].map((f) => f.detail);
          expect({ ...auditCounts(audit), faults: faults.slice(0, 5) }, e.name).toEqual({ ...ZERO, faults: [] });
        }
      });
    }
  }
});
