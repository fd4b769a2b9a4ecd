import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../../core/analysis/analyseDocument.ts';
import { auditCounts, auditScene } from '../../../../core/figure/audit/auditScene.ts';
import { layoutFigure } from '../../../../core/figure/layoutFigure.ts';
import { loadStructureToolkit } from '../../../../core/structure/loadStructureToolkit.ts';
import { pointDepictions } from '../../../../core/structure/pointDepictions.ts';
import { readStructures } from '../../../../core/structure/readStructures.ts';
import { manyStructuresDocument, structuresDocument } from '../../../fixtures/structuresDocument.ts';
import { fontMetrics } from '../fontFixture.ts';

const toolkit = await loadStructureToolkit();
const metrics = fontMetrics();
const none = { crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 };

// The figure-fidelity audit (core/figure/audit) judges figures with a molecule on every point
// the same way as the label corpus: drawings are obstacles like any other primitive.
describe('geometry audit of figures with structures', { timeout: 60_000 }, () => {
  const corpus = [['ester hydrolysis', structuresDocument()], ['20 states', manyStructuresDocument(20)], ['2 pathways × 8 states', manyStructuresDocument(8, 2)]] as const;
  for (const [name, doc] of corpus) {
    it(`${name}: zero faults in every preset and theme`, () => {
      const table = readStructures(doc, toolkit);
      const profile = analyseDocument(doc, table).profile;
      for (const preset of ['single', 'double', 'slide'] as const) {
        for (const theme of ['colour', 'greyscale', 'dark'] as const) {
          const scene = layoutFigure(profile, doc, { metrics, preset, theme, structures: pointDepictions(doc, table) });
          expect(scene.items.some((i) => i.role === 'structure'), `${preset}/${theme} draws structures`).toBe(true);
          expect(auditCounts(auditScene(scene)), `${preset}/${theme}`).toEqual(none);
        }
      }
    });
  }
});
