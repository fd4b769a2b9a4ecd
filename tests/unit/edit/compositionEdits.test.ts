import { describe, expect, it } from 'vitest';
import { compositionProblem, setComposition } from '../../../core/edit/compositionEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

const point = (doc: ReturnType<typeof twoRoutes>, id: string) => doc.pathways[0]!.points.find((p) => p.id === id)!;

describe('composition edits', () => {
  it('sets species and counts on a typed point, merging repeated species', () => {
    // Rule from the document format (core/model/schema.ts Point.composition): terms are species ids with positive counts.
    const doc = twoRoutes();
    const next = setComposition(doc, { pathway: 'p', point: 'r', terms: [{ species: 'a', count: 1 }, { species: 'b', count: 2 }, { species: 'a', count: 1 }] });
    expect(point(next, 'r').composition).toEqual([{ species: 'a', count: 2 }, { species: 'b', count: 2 }]);
    expect(point(doc, 'r').composition).toBeUndefined();
    expect(next.pathways[1]).toBe(doc.pathways[1]);
    expectLoadable(next);
  });

  it('an empty list removes the composition; the same terms again change nothing', () => {
    const doc = setComposition(twoRoutes(), { pathway: 'p', point: 'r', terms: [{ species: 'a', count: 1 }] });
    expect(setComposition(doc, { pathway: 'p', point: 'r', terms: [{ species: 'a', count: 1 }] })).toBe(doc);
    const cleared = setComposition(doc, { pathway: 'p', point: 'r', terms: [] });
    expect('composition' in point(cleared, 'r')).toBe(false);
    expect(setComposition(cleared, { pathway: 'p', point: 'r', terms: null })).toBe(cleared);
  });

  it('an unknown species or a count that is not positive is refused with the term named', () => {
    const doc = twoRoutes();
    expect(compositionProblem(doc, [{ species: 'a', count: 1 }, { species: 'zz', count: 1 }])).toBe('composition term 2: no species with id "zz"');
    expect(compositionProblem(doc, [{ species: 'b', count: 0 }])).toMatch(/term 1: the count of b must be a positive number/);
    expect(compositionProblem(doc, [{ species: 'b', count: Number.NaN }])).toMatch(/positive number/);
    expect(setComposition(doc, { pathway: 'p', point: 'r', terms: [{ species: 'zz', count: 1 }] })).toBe(doc);
  });
});
