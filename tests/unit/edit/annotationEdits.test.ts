import { describe, expect, it } from 'vitest';
import { addAnnotation, annotationProblem, removeAnnotation } from '../../../core/edit/annotationEdits.ts';
import { setCycle } from '../../../core/edit/pathwayEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

describe('annotation edits', () => {
  it('adds a barrier arrow between two points of a pathway; a repeat or a missing point is refused', () => {
    const doc = twoRoutes();
    const next = addAnnotation(doc, { annotation: { type: 'barrier', pathway: 'p', from: 't', to: 'i' } });
    expect(next.figure.annotations).toHaveLength(2);
    expectLoadable(next);
    expect(addAnnotation(doc, { annotation: { type: 'barrier', pathway: 'p', from: 'r', to: 't' } })).toBe(doc);
    expect(annotationProblem(doc, { type: 'barrier', pathway: 'p', from: 'r', to: 'zz' })).toBe('pathway "Route" has no point "zz"');
    expect(annotationProblem(doc, { type: 'barrier', pathway: 'p', from: 'r', to: 'r' })).toBe('a barrier arrow needs two different points');
  });

  it('the energetic-span bracket needs a catalytic cycle', () => {
    // The energetic span is defined for a catalytic cycle (Kozuch & Shaik, Acc. Chem. Res. 2011, 44, 101).
    const doc = twoRoutes();
    expect(annotationProblem(doc, { type: 'span', pathway: 'p' })).toBe('pathway "Route" is not marked as a catalytic cycle');
    const cycle = setCycle(doc, { pathway: 'p', cycle: true });
    const next = addAnnotation(cycle, { annotation: { type: 'span', pathway: 'p' } });
    expect(next.figure.annotations.at(-1)).toEqual({ type: 'span', pathway: 'p' });
    expectLoadable(next);
  });

  it('free text is trimmed, needs words and a finite place; remove takes it away by index', () => {
    const doc = twoRoutes();
    const next = addAnnotation(doc, { annotation: { type: 'text', text: '  rate-limiting  ', x: 1.5, y: 12 } });
    expect(next.figure.annotations.at(-1)).toEqual({ type: 'text', text: 'rate-limiting', x: 1.5, y: 12 });
    expect(annotationProblem(doc, { type: 'text', text: ' ', x: 0, y: 0 })).toBe('text: expected some words');
    expect(addAnnotation(doc, { annotation: { type: 'text', text: 'a', x: Number.NaN, y: 0 } })).toBe(doc);
    expect(removeAnnotation(next, { index: 0 }).figure.annotations).toEqual([{ type: 'text', text: 'rate-limiting', x: 1.5, y: 12 }]);
    expect(removeAnnotation(next, { index: 9 })).toBe(next);
  });
});
