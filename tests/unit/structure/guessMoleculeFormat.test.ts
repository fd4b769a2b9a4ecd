import { describe, expect, it } from 'vitest';
import { setSpeciesMolecule } from '../../../core/edit/moleculeEdits.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { guessMoleculeFormat } from '../../../core/structure/guessMoleculeFormat.ts';

describe('guessMoleculeFormat', () => {
  it('tells SMILES, molfiles and XYZ geometries apart, a file extension first', () => {
    expect(guessMoleculeFormat('CC(=O)O')).toBe('smiles');
    expect(guessMoleculeFormat('c1ccccc1')).toBe('smiles');
    expect(guessMoleculeFormat('x\n  prog\n\n  1  0  0  0  0  0  0  0  0  0999 V2000\n    0.0 0.0 0.0 C  0\nM  END')).toBe('molfile');
    expect(guessMoleculeFormat('3\nwater\nO 0 0 0\nH 0 0.76 -0.47\nH 0 -0.76 -0.47')).toBe('xyz');
    expect(guessMoleculeFormat('O 0.0 0.0 0.117\nH 0.0 0.757 -0.467')).toBe('xyz');
    expect(guessMoleculeFormat('CCO', 'ethanol.xyz')).toBe('xyz');
    expect(guessMoleculeFormat('O 0 0 0', 'thing.smi')).toBe('smiles');
  });
});

describe('setSpeciesMolecule', () => {
  const doc = makeDocument({ species: [{ id: 's', label: 's', charge: -1 }] });
  it('sets, keeps the same document for the same text, and removes on blank', () => {
    const set = setSpeciesMolecule(doc, { species: 's', text: ' CC(=O)[O-] ' });
    expect(set.species[0]!.molecule).toEqual({ format: 'smiles', text: 'CC(=O)[O-]' });
    expect(setSpeciesMolecule(set, { species: 's', text: 'CC(=O)[O-]' })).toBe(set);
    expect(setSpeciesMolecule(set, { species: 's', text: '  ' }).species[0]!.molecule).toBeUndefined();
    expect(setSpeciesMolecule(doc, { species: 'nobody', text: 'C' })).toBe(doc);
  });
  it('gives an XYZ geometry the species’ typed charge', () => {
    expect(setSpeciesMolecule(doc, { species: 's', text: 'O 0 0 0\nH 0 0.96 0' }).species[0]!.molecule).toMatchObject({ format: 'xyz', charge: -1 });
  });
});
