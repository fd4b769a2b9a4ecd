import { describe, expect, it } from 'vitest';
import { parseDocument, serializeDocument } from '../../../core/model/load.ts';
import { structuresDocument } from '../../fixtures/structuresDocument.ts';

const withSpeciesMolecule = (molecule: unknown) => JSON.stringify({ format: 'passline', version: 2, species: [{ id: 's', label: 's', molecule }] });

describe('molecule fields of the document', () => {
  it('round-trips a document with structures on species and points', () => {
    const doc = structuresDocument();
    const again = parseDocument(serializeDocument(doc));
    expect(again.ok && again.doc).toEqual(doc);
  });

  it('names the field of a bad structure format, an empty text and an out-of-range charge', () => {
    const bad = (molecule: unknown) => { const r = parseDocument(withSpeciesMolecule(molecule)); return r.ok ? [] : r.errors; };
    expect(bad({ format: 'pdb', text: 'ATOM' })).toEqual([{ path: 'species[0].molecule.format', message: 'expected a structure format (smiles, molfile, xyz), got "pdb"' }]);
    expect(bad({ format: 'smiles', text: '  ' })[0]).toMatchObject({ path: 'species[0].molecule.text', message: 'expected a structure (SMILES, molfile or XYZ text)' });
    expect(bad({ format: 'xyz', text: 'O 0 0 0', charge: 150 })[0]?.path).toBe('species[0].molecule.charge');
  });
});
