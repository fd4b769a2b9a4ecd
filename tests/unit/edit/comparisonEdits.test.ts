import { describe, expect, it } from 'vitest';
import { addComparison, removeComparison } from '../../../core/edit/comparisonEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

describe('comparison edits', () => {
  it('adds a selectivity comparison between known pathways and removes one', () => {
    const doc = twoRoutes();
    const next = addComparison(doc, { comparison: { type: 'selectivity', pathways: ['p', 'q'], enantiomeric: false } });
    expect(next.comparisons).toHaveLength(2);
    expectLoadable(next);
    expect(removeComparison(next, { index: 0 }).comparisons).toEqual([{ type: 'selectivity', pathways: ['p', 'q'], enantiomeric: false }]);
  });

  it('refuses unknown pathways, self-comparisons and duplicates', () => {
    const doc = twoRoutes();
    expect(addComparison(doc, { comparison: { type: 'rate', baseline: 'p', candidate: 'nowhere' } })).toBe(doc);
    expect(addComparison(doc, { comparison: { type: 'rate', baseline: 'p', candidate: 'p' } })).toBe(doc);
    expect(addComparison(doc, { comparison: { type: 'rate', baseline: 'p', candidate: 'q' } })).toBe(doc);
    expect(removeComparison(doc, { index: 5 })).toBe(doc);
  });
});
