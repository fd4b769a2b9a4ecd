import { describe, expect, it } from 'vitest';
import { addSpecies, deleteSpecies, pasteSpecies, setSpeciesCell, speciesUsers } from '../../../core/edit/speciesEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

describe('species sheet edits', () => {
  it('a cell edit sets the number; a bad number is reported with row and column and nothing changes', () => {
    const doc = twoRoutes();
    const ok = setSpeciesCell(doc, { row: 0, column: 'gCorrection', text: '0.0123' });
    expect(ok.errors).toEqual([]);
    expect(ok.doc.species[0]!.structures[0]).toEqual({ electronic: -100, gCorrection: 0.0123 });
    const bad = setSpeciesCell(doc, { row: 0, column: 'electronic', text: '-1OO.5' });
    expect(bad.doc).toBe(doc);
    expect(bad.errors).toEqual([{ row: 0, column: 'electronic', value: '-1OO.5', message: 'expected a number in Eh' }]);
  });

  it('renaming an id renames it in the points that use it', () => {
    const next = setSpeciesCell(twoRoutes(), { row: 0, column: 'id', text: 'alpha' }).doc;
    const s = next.pathways[0]!.points[3]!.energy;
    expect(s.mode === 'species' && s.terms[0]!.species).toBe('alpha');
    expectLoadable(next);
  });

  it('pastes a tab-separated block with a header, adding rows past the end', () => {
    const text = 'label\tE\tG correction\nA\t-100.25\t0.05\nC\t-50.5\t0.01\n';
    const { doc, errors } = pasteSpecies(twoRoutes(), { text, row: 0, column: 'id' });
    expect(errors).toEqual([]);
    expect(doc.species.map((s) => [s.id, s.label, s.structures[0]?.electronic, s.structures[0]?.gCorrection]))
      .toEqual([['a', 'A', -100.25, 0.05], ['b', 'C', -50.5, 0.01]]);
    expectLoadable(doc);
  });

  it('a headerless block fills columns from the anchor cell; all bad cells reported, nothing half-applied', () => {
    const doc = twoRoutes();
    const good = pasteSpecies(doc, { text: '-10\t0.1\n-20\t0.2\n-30\t0.3', row: 1, column: 'electronic' });
    expect(good.errors).toEqual([]);
    expect(good.doc.species).toHaveLength(4);
    expect(good.doc.species[3]!.structures[0]).toEqual({ electronic: -30, singlePoint: 0.3 });
    const bad = pasteSpecies(doc, { text: '-10\tx\nabc\t0.2', row: 0, column: 'electronic' });
    expect(bad.doc).toBe(doc);
    expect(bad.errors.map((e) => [e.row, e.column, e.value])).toEqual([[0, 'singlePoint', 'x'], [1, 'electronic', 'abc']]);
  });

  it('a headerless row wider than the first still fills rightwards; a headed block names a cell without a header', () => {
    const doc = twoRoutes();
    const ragged = pasteSpecies(doc, { text: '-10\n-20\t0.2\t0.03', row: 0, column: 'electronic' });
    expect(ragged.errors).toEqual([]);
    expect(ragged.doc.species[1]!.structures[0]).toEqual({ electronic: -20, singlePoint: 0.2, hCorrection: 0.03 });
    const headed = pasteSpecies(doc, { text: 'label\tE\nA\t-1\t0.5', row: 0, column: 'id' });
    expect(headed.doc).toBe(doc);
    expect(headed.errors.map((e) => e.message)).toEqual(['column 3 of the pasted block has no header']);
  });

  it('a species in use cannot be deleted; an unused one can', () => {
    const doc = twoRoutes();
    expect(deleteSpecies(doc, { species: 'a' })).toBe(doc);
    expect(speciesUsers(doc, 'a')).toEqual(['Route: S']);
    expect(deleteSpecies(doc, { species: 'b' }).species.map((s) => s.id)).toEqual(['a']);
    expect(addSpecies(doc).species.at(-1)).toMatchObject({ id: 's3', label: 'S3' });
  });
});
