import { describe, expect, it } from 'vitest';
import { referenceFallback, referenceProblem, referenceSummary, setReference } from '../../../core/edit/referenceEdits.ts';
import { deletePoint, setPointMolecule } from '../../../core/edit/pointEdits.ts';
import { deletePathway } from '../../../core/edit/pathwayEdits.ts';
import { deleteSpecies, setSpeciesCell, speciesUsers } from '../../../core/edit/speciesEdits.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

// 1 kcal = 4184 J (thermochemical calorie, NIST SP 811 App. B; REFERENCE.md §1).
const KCAL = 4184;

describe('setReference', () => {
  it('measures every pathway from a chosen point: the typed barrier of 20 kcal/mol puts R at −20', () => {
    const doc = setReference(twoRoutes(), { reference: { kind: 'point', pathway: 'p', point: 't' } });
    expectLoadable(doc);
    const route = resolveProfile(doc).pathways[0]!.points;
    expect(route[0]!.energyJ! / KCAL).toBeCloseTo(-20, 9);
    expect(route[1]!.energyJ).toBeCloseTo(0, 9);
    expect(resolveProfile(doc).reference?.text).toBe('every pathway measured from "TS" (Route)');
  });

  it('takes a species sum and goes back to the document-wide zero', () => {
    const sum = setReference(twoRoutes(), { reference: { kind: 'species', terms: [{ species: 'a', count: 2 }] } });
    expect(sum.settings.reference).toEqual({ kind: 'species', terms: [{ species: 'a', count: 2 }] });
    expectLoadable(sum);
    expect(referenceSummary(sum, sum.settings.reference)).toBe('2 A');
    const zero = setReference(sum, { reference: { kind: 'zero' } });
    expect(zero.settings.reference).toEqual({ kind: 'zero' });
    expect(setReference(zero, { reference: { kind: 'zero' } })).toBe(zero);
  });

  it('refuses an empty sum, an unknown species and a missing point, leaving the document as it was', () => {
    const doc = twoRoutes();
    expect(referenceProblem(doc, { kind: 'species', terms: [] })).toBe('expected at least one species');
    expect(referenceProblem(doc, { kind: 'species', terms: [{ species: 'zz', count: 1 }] })).toBe('no species with id "zz"');
    expect(referenceProblem(doc, { kind: 'point', pathway: 'p', point: 'gone' })).toBe('no point with id "gone" in pathway "Route"');
    expect(referenceProblem(doc, { kind: 'point', pathway: 'nope', point: 'r' })).toBe('no pathway with id "nope"');
    expect(setReference(doc, { reference: { kind: 'species', terms: [] } })).toBe(doc);
    expect(setReference(doc, { reference: { kind: 'point', pathway: 'p', point: 'gone' } })).toBe(doc);
  });
});

describe('a deleted reference point', () => {
  const atTs = () => setReference(twoRoutes(), { reference: { kind: 'point', pathway: 'p', point: 't' } });

  it('falls back to the document-wide zero, and the edit says so', () => {
    const before = atTs();
    const after = deletePoint(before, { pathway: 'p', point: 't' });
    expect(after.settings.reference).toEqual({ kind: 'zero' });
    expectLoadable(after);
    expect(referenceFallback(before, after)).toBe('“TS” (Route) was the reference point and is gone: energies are now measured from the document-wide zero. Undo brings both back.');
    const noPathway = deletePathway(before, { pathway: 'p' });
    expect(referenceFallback(before, noPathway)).toMatch(/^“TS” \(Route\) was the reference point/);
  });

  it('is not reported for other edits or for choosing another reference', () => {
    const before = atTs();
    expect(referenceFallback(before, deletePoint(before, { pathway: 'p', point: 'i' }))).toBeNull();
    expect(referenceFallback(before, setReference(before, { reference: { kind: 'zero' } }))).toBeNull();
  });
});

describe('species in the reference sum', () => {
  const sum = () => setReference(twoRoutes(), { reference: { kind: 'species', terms: [{ species: 'b', count: 1 }] } });

  it('cannot be deleted while the reference uses them', () => {
    const doc = sum();
    expect(speciesUsers(doc, 'b')).toEqual(['the reference (what energies are measured from)']);
    expect(deleteSpecies(doc, { species: 'b' })).toBe(doc);
  });

  it('follow a change of species id', () => {
    const renamed = setSpeciesCell(sum(), { row: 1, column: 'id', text: 'bb' });
    expect(renamed.errors).toEqual([]);
    expect(renamed.doc.settings.reference).toEqual({ kind: 'species', terms: [{ species: 'bb', count: 1 }] });
    expectLoadable(renamed.doc);
  });
});

describe('setPointMolecule', () => {
  it('sets, keeps the same document for the same text, and clears on blank', () => {
    const doc = twoRoutes();
    const set = setPointMolecule(doc, { pathway: 'p', point: 't', text: ' O=C1CCCN1 ' });
    expect(set.pathways[0]!.points[1]!.molecule).toEqual({ format: 'smiles', text: 'O=C1CCCN1' });
    expectLoadable(set);
    expect(setPointMolecule(set, { pathway: 'p', point: 't', text: 'O=C1CCCN1' })).toBe(set);
    const cleared = setPointMolecule(set, { pathway: 'p', point: 't', text: '' });
    expect('molecule' in cleared.pathways[0]!.points[1]!).toBe(false);
    expect(setPointMolecule(doc, { pathway: 'p', point: 'nobody', text: 'C' })).toBe(doc);
  });

  it('reads a pasted XYZ block as a geometry, a file name first', () => {
    const xyz = setPointMolecule(twoRoutes(), { pathway: 'p', point: 'r', text: '3\nwater\nO 0 0 0\nH 0 0.76 0.59\nH 0 -0.76 0.59\n' });
    expect(xyz.pathways[0]!.points[0]!.molecule?.format).toBe('xyz');
    expect(setPointMolecule(twoRoutes(), { pathway: 'p', point: 'r', text: 'CCO', fileName: 'e.smi' }).pathways[0]!.points[0]!.molecule?.format).toBe('smiles');
  });
});
