import { describe, expect, it } from 'vitest';
import { deletePoint, duplicatePoint, energyProblem, insertPoint, movePoint, setEnergy, setKind, setLabel } from '../../../core/edit/pointEdits.ts';
import { setLabelOffset, setPointX } from '../../../core/edit/layoutEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

const ids = (doc: ReturnType<typeof twoRoutes>, p = 0) => doc.pathways[p]!.points.map((q) => q.id);

describe('point edits', () => {
  it('insert a new minimum at an index with a unique id, typed as 0 in the display unit', () => {
    const doc = twoRoutes();
    const next = insertPoint(doc, { pathway: 'p', index: 1, point: { id: 'r', label: 'R2', kind: 'min', energy: { mode: 'value', value: 1, unit: 'kJ/mol' } } });
    expect(ids(next)).toEqual(['r', 'r-2', 't', 'i', 's']);
    const plain = insertPoint(doc, { pathway: 'p' });
    expect(plain.pathways[0]!.points.at(-1)).toMatchObject({ label: 'P5', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } });
    expectLoadable(next);
    expect(doc.pathways[0]!.points).toHaveLength(4);
  });

  it('delete a point, with the annotations that name it, and share untouched pathways', () => {
    const doc = twoRoutes();
    const next = deletePoint(doc, { pathway: 'p', point: 't' });
    expect(ids(next)).toEqual(['r', 'i', 's']);
    expect(next.figure.annotations).toEqual([]);
    expect(next.pathways[1]).toBe(doc.pathways[1]);
    expectLoadable(next);
  });

  it('duplicate puts a copy right after the original without its layout overrides', () => {
    const doc = setPointX(twoRoutes(), { pathway: 'p', point: 't', x: 3 });
    const next = duplicatePoint(doc, { pathway: 'p', point: 't' });
    expect(ids(next)).toEqual(['r', 't', 't-2', 'i', 's']);
    expect(next.pathways[0]!.points[2]).toMatchObject({ label: 'TS copy', kind: 'ts' });
    expect(next.pathways[0]!.points[2]!.x).toBeUndefined();
  });

  it('move reorders and clamps; kind, label and energy change only what they name', () => {
    const doc = twoRoutes();
    expect(ids(movePoint(doc, { pathway: 'p', point: 'r', to: 99 }))).toEqual(['t', 'i', 's', 'r']);
    expect(setKind(doc, { pathway: 'p', point: 'r', kind: 'ts' }).pathways[0]!.points[0]!.kind).toBe('ts');
    expect(setLabel(doc, { pathway: 'p', point: 'r', label: 'Start' }).pathways[0]!.points[0]!.label).toBe('Start');
    const typed = setEnergy(doc, { pathway: 'p', point: 's', energy: { mode: 'value', value: 3, unit: 'eV' } });
    expect(typed.pathways[0]!.points[3]!.energy).toEqual({ mode: 'value', value: 3, unit: 'eV' });
  });

  it('returns the very same document when nothing changes, so "enabled?" is an identity test', () => {
    const doc = twoRoutes();
    expect(movePoint(doc, { pathway: 'p', point: 'r', to: 0 })).toBe(doc);
    expect(setKind(doc, { pathway: 'p', point: 't', kind: 'ts' })).toBe(doc);
    expect(setLabel(doc, { pathway: 'p', point: 'missing', label: 'x' })).toBe(doc);
    expect(deletePoint(doc, { pathway: 'nowhere', point: 'r' })).toBe(doc);
    expect(setEnergy(doc, { pathway: 'p', point: 't', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol' } })).toBe(doc);
    expect(setPointX(doc, { pathway: 'p', point: 't', x: null })).toBe(doc);
  });

  it('refuses an energy the schema would refuse and says why', () => {
    const doc = twoRoutes();
    const bad = { mode: 'species' as const, terms: [] };
    expect(setEnergy(doc, { pathway: 'p', point: 's', energy: bad })).toBe(doc);
    expect(energyProblem(bad)).toMatch(/terms: expected at least one species/);
    expect(energyProblem({ mode: 'value', value: Number.NaN, unit: 'kcal/mol' })).toMatch(/value/);
  });

  it('label offsets and x overrides are set and cleared', () => {
    const doc = twoRoutes();
    const moved = setLabelOffset(doc, { pathway: 'p', point: 'i', offset: { dx: 1.5, dy: -2 } });
    expect(moved.pathways[0]!.points[2]!.labelOffsetMm).toEqual({ dx: 1.5, dy: -2 });
    expect(setLabelOffset(moved, { pathway: 'p', point: 'i', offset: { dx: 1.5, dy: -2 } })).toBe(moved);
    expect(setLabelOffset(moved, { pathway: 'p', point: 'i', offset: null }).pathways[0]!.points[2]!.labelOffsetMm).toBeUndefined();
    expectLoadable(moved);
  });
});
