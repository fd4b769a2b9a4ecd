import { describe, expect, it } from 'vitest';
import { addConformer, canDeleteConformer, deleteConformer, duplicateConformer, pasteConformers, setConformerCell } from '../../../core/edit/conformerEdits.ts';
import { makeDocument } from '../../../core/model/load.ts';
import type { Document } from '../../../core/model/schema.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

/** Invented: species "a" with two labelled conformers, species "b" with none. */
function twoConformers(): Document {
  return makeDocument({
    species: [
      { id: 'a', label: 'A', structures: [{ label: 'x', electronic: -100, gCorrection: 0.05 }, { label: 'y', electronic: -100.001, hCorrection: 0.07, gCorrection: 0.051 }] },
      { id: 'b', label: 'B', structures: [] },
    ],
    pathways: [{ id: 'p', name: 'Route', points: [{ id: 's', label: 'S', kind: 'min', energy: { mode: 'species', terms: [{ species: 'a', count: 1 }] } }] }],
  });
}

const structures = (doc: Document, id = 'a') => doc.species.find((s) => s.id === id)!.structures;

describe('conformer edits', () => {
  it('adds a copy of the last conformer with a fresh label; a species without conformers is left alone', () => {
    const doc = twoConformers();
    const next = addConformer(doc, { species: 'a' });
    expect(structures(next)).toEqual([...structures(doc), { label: 'y (copy)', electronic: -100.001, hCorrection: 0.07, gCorrection: 0.051 }]);
    expect(structures(addConformer(next, { species: 'a' }))[3]!.label).toBe('y (copy 2)');
    expect(addConformer(doc, { species: 'b' })).toBe(doc);
    expect(addConformer(doc, { species: 'nobody' })).toBe(doc);
    // Unlabelled conformers stay unlabelled.
    expect(structures(addConformer(twoRoutes(), { species: 'a' }))).toEqual([{ electronic: -100 }, { electronic: -100 }]);
    expectLoadable(next);
  });

  it('duplicates a conformer right after itself', () => {
    const doc = twoConformers();
    const next = duplicateConformer(doc, { species: 'a', row: 0 });
    expect(structures(next).map((s) => s.label)).toEqual(['x', 'x (copy)', 'y']);
    expect(structures(next)[1]).toEqual({ label: 'x (copy)', electronic: -100, gCorrection: 0.05 });
    expect(duplicateConformer(doc, { species: 'a', row: 5 })).toBe(doc);
  });

  it('deletes a conformer but never the last one of a species', () => {
    const doc = twoConformers();
    const one = deleteConformer(doc, { species: 'a', row: 0 });
    expect(structures(one).map((s) => s.label)).toEqual(['y']);
    expect(canDeleteConformer(one, { species: 'a', row: 0 })).toBe(false);
    expect(deleteConformer(one, { species: 'a', row: 0 })).toBe(one);
    expect(deleteConformer(doc, { species: 'a', row: 2 })).toBe(doc);
    expectLoadable(one);
  });

  it('sets a cell from text with a decimal comma or a Unicode minus; the same text changes nothing', () => {
    const doc = twoConformers();
    const comma = setConformerCell(doc, { species: 'a', row: 1, column: 'gCorrection', text: '0,0495' });
    expect(comma.errors).toEqual([]);
    expect(structures(comma.doc)[1]!.gCorrection).toBe(0.0495);
    const minus = setConformerCell(doc, { species: 'a', row: 0, column: 'singlePoint', text: '\u2212100.2' });
    expect(structures(minus.doc)[0]).toEqual({ label: 'x', electronic: -100, singlePoint: -100.2, gCorrection: 0.05 });
    expect(setConformerCell(doc, { species: 'a', row: 0, column: 'electronic', text: '-100' }).doc).toBe(doc);
    expect(setConformerCell(doc, { species: 'a', row: 0, column: 'label', text: ' x ' }).doc).toBe(doc);
    // Clearing an optional cell removes the value; clearing the label drops it.
    const cleared = setConformerCell(doc, { species: 'a', row: 1, column: 'hCorrection', text: '' }).doc;
    expect(structures(cleared)[1]).toEqual({ label: 'y', electronic: -100.001, gCorrection: 0.051 });
    expect(structures(setConformerCell(doc, { species: 'a', row: 0, column: 'label', text: '' }).doc)[0]).toEqual({ electronic: -100, gCorrection: 0.05 });
  });

  it('a bad cell is refused with a message naming the field and the text', () => {
    const doc = twoConformers();
    const bad = setConformerCell(doc, { species: 'a', row: 1, column: 'electronic', text: 'abc' });
    expect(bad.doc).toBe(doc);
    expect(bad.errors).toEqual([{ row: 1, column: 'electronic', value: 'abc', message: 'E: expected a number in hartree, got "abc"' }]);
    const empty = setConformerCell(doc, { species: 'a', row: 0, column: 'electronic', text: ' ' });
    expect(empty.doc).toBe(doc);
    expect(empty.errors[0]!.message).toBe('E: expected the electronic energy in hartree; every conformer needs one');
    expect(setConformerCell(doc, { species: 'a', row: 0, column: 'hCorrection', text: '1e' }).errors[0]!.message).toBe('H correction: expected a number in hartree, got "1e"');
  });

  it('pastes a block with a header, adding conformers past the end (even to a species without any)', () => {
    const doc = twoConformers();
    const { doc: next, errors } = pasteConformers(doc, { species: 'b', row: 0, column: 'label', text: 'label\tE\tG correction\nb1\t-50,25\t0.01\nb2\t-50.249\t0.012\n' });
    expect(errors).toEqual([]);
    expect(structures(next, 'b')).toEqual([{ label: 'b1', electronic: -50.25, gCorrection: 0.01 }, { label: 'b2', electronic: -50.249, gCorrection: 0.012 }]);
    expect(next.species[0]).toBe(doc.species[0]);
    expectLoadable(next);
  });

  it('a headerless block fills from the anchor column; with any bad cell nothing is pasted and every bad cell is named', () => {
    const doc = twoConformers();
    const good = pasteConformers(doc, { species: 'a', row: 1, column: 'electronic', text: '-100.002\t\t0.071\n-100.003\t-99.9\t0.072\t0.052' });
    expect(good.errors).toEqual([]);
    expect(structures(good.doc).slice(1)).toEqual([
      { label: 'y', electronic: -100.002, hCorrection: 0.071, gCorrection: 0.051 },
      { electronic: -100.003, singlePoint: -99.9, hCorrection: 0.072, gCorrection: 0.052 },
    ]);
    const bad = pasteConformers(doc, { species: 'a', row: 0, column: 'electronic', text: '-1OO\t\tx\n\t-99\n-1\t\t\t\t\t\t9' });
    expect(bad.doc).toBe(doc);
    // The seventh cell from E lies past σ correction, the last conformer column.
    expect(bad.errors.map((e) => [e.row, e.column, e.value])).toEqual([[2, 'correctionSigma', '9']]);
    const cells = pasteConformers(doc, { species: 'a', row: 0, column: 'electronic', text: '-1OO\t\tx\n-100\t-99,5,1' });
    expect(cells.doc).toBe(doc);
    expect(cells.errors.map((e) => [e.row, e.column, e.message])).toEqual([
      [0, 'electronic', 'E: expected a number in hartree, got "-1OO"'],
      [0, 'hCorrection', 'H correction: expected a number in hartree, got "x"'],
      [1, 'singlePoint', 'E (single point): expected a number in hartree, got "-99,5,1"'],
    ]);
  });
});
