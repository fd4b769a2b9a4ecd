import { describe, expect, it } from 'vitest';
import { parseFormula } from '../../../core/thermo/formula.ts';
import { compareCompositions } from '../../../core/thermo/composition.ts';
import { loadStructureToolkit } from '../../../core/structure/loadStructureToolkit.ts';

const toolkit = await loadStructureToolkit();
// OpenChemLib's first layout is slow (it starts its templates): do it before the timed tests.
toolkit.read({ format: 'smiles', text: 'c1ccccc1' });
const smiles = (text: string, extra: object = {}) => toolkit.read({ format: 'smiles', text, ...extra });

// Molecular formulas and net charges as listed in the PubChem compound records of these
// substances (pubchem.ncbi.nlm.nih.gov; formulas from memory, each a textbook formula).
const PUBCHEM: readonly [name: string, smiles: string, formula: string, charge: number][] = [
  ['water', 'O', 'H2O', 0],
  ['ethanol', 'CCO', 'C2H6O', 0],
  ['benzene', 'c1ccccc1', 'C6H6', 0],
  ['acetic acid', 'CC(=O)O', 'C2H4O2', 0],
  ['acetate', 'CC(=O)[O-]', 'C2H3O2', -1],
  ['ammonium', '[NH4+]', 'H4N', 1],
  ['sulfate', '[O-]S(=O)(=O)[O-]', 'O4S', -2],
  ['tetramethylammonium', 'C[N+](C)(C)C', 'C4H12N', 1],
  ['pyridine', 'c1ccncc1', 'C5H5N', 0],
  ['chlorobenzene', 'Clc1ccccc1', 'C6H5Cl', 0],
  ['aspirin', 'CC(=O)Oc1ccccc1C(=O)O', 'C9H8O4', 0],
  ['caffeine', 'Cn1cnc2c1c(=O)n(C)c(=O)n2C', 'C8H10N4O2', 0],
  ['D-glucose', 'OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O', 'C6H12O6', 0],
  ['triphenylphosphine', 'c1ccc(cc1)P(c1ccccc1)c1ccccc1', 'C18H15P', 0],
  ['heavy water', '[2H]O[2H]', 'D2O', 0],
];

describe('openChemLibToolkit.read (SMILES)', () => {
  it.each(PUBCHEM)('%s: formula and charge as in PubChem', (_name, text, formula, charge) => {
    const read = smiles(text);
    if (!read.ok) throw new Error(read.message);
    const expected = parseFormula(formula, { charge });
    if (!expected.ok) throw new Error(expected.error.message);
    expect(compareCompositions(read.value.composition, expected.value).equal).toBe(true);
    expect(read.value.composition.charge).toBe(charge);
    expect(read.value.formula).toBe(formula);
  });

  it('names what is wrong with a bad SMILES instead of throwing', () => {
    const read = smiles('C1CC(');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toMatch(/^SMILES: /);
  });

  it('depicts ethanol with three heavy atoms, an OH label and unit bonds', () => {
    const read = smiles('CCO');
    if (!read.ok) throw new Error(read.message);
    const { atoms, bonds } = read.value.depiction;
    expect(atoms.map((a) => a.element)).toEqual(['C', 'C', 'O']);
    expect(atoms[2]!.hydrogens).toBe(1);
    for (const b of bonds) expect(Math.hypot(atoms[b.from]!.x - atoms[b.to]!.x, atoms[b.from]!.y - atoms[b.to]!.y)).toBeCloseTo(1, 6);
  });

  it('marks a transition state’s forming and breaking bonds by atom map numbers', () => {
    // SN2 at methyl: Cl···C···Br, both partial bonds written as bonds.
    const read = smiles('[Cl:1][CH3:2][Br:3]', { partialBonds: [[1, 2], [2, 3]] });
    if (!read.ok) throw new Error(read.message);
    expect(read.value.depiction.bonds.filter((b) => b.partial)).toHaveLength(2);
    expect(read.value.formula).toBe('CH3BrCl');
    const missing = smiles('[Cl:1][CH3:2][Br:3]', { partialBonds: [[1, 4]] });
    expect(missing.ok ? '' : missing.message).toMatch(/map number 4/);
  });

  it('adds a forming bond that the SMILES leaves out, without changing the formula', () => {
    const read = smiles('[OH2:1].[CH3+:2]', { partialBonds: [[1, 2]] });
    if (!read.ok) throw new Error(read.message);
    expect(read.value.formula).toBe('CH5O');
    expect(read.value.composition.charge).toBe(1);
    expect(read.value.depiction.bonds.some((b) => b.partial)).toBe(true);
  });

  it('keeps wedges of a stereocentre', () => {
    const read = smiles('C[C@H](Cl)CC');
    if (!read.ok) throw new Error(read.message);
    expect(read.value.depiction.bonds.some((b) => b.stereo !== 'none')).toBe(true);
  });
});

describe('openChemLibToolkit.read (molfile, XYZ)', () => {
  // Formaldehyde, hand-written V2000 molfile with 2D coordinates (y up, as molfiles are).
  const molfile = ['formaldehyde', '  hand', '', '  2  1  0  0  0  0  0  0  0  0999 V2000',
    '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
    '    0.0000    1.5000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0',
    '  1  2  2  0', 'M  END', ''].join('\n');

  it('reads a molfile and keeps its 2D coordinates (O drawn above C)', () => {
    const read = toolkit.read({ format: 'molfile', text: molfile });
    if (!read.ok) throw new Error(read.message);
    expect(read.value.formula).toBe('CH2O');
    const [c, o] = read.value.depiction.atoms;
    expect(o!.y).toBeLessThan(c!.y);
    expect(read.value.depiction.bonds[0]!.order).toBe(2);
  });

  it('reads an XYZ geometry: formula from the atoms, charge as given, bonds perceived', () => {
    // Formate anion HCOO⁻ (invented geometry, bond lengths of the usual size).
    const xyz = ['4', 'formate', 'C 0.000 0.000 0.000', 'O 1.250 0.000 0.000', 'O -0.625 1.083 0.000', 'H -0.550 -0.950 0.000'].join('\n');
    const read = toolkit.read({ format: 'xyz', text: xyz, charge: -1 });
    if (!read.ok) throw new Error(read.message);
    expect(read.value.formula).toBe('CHO2');
    expect(read.value.composition.charge).toBe(-1);
    expect(read.value.depiction.atoms).toHaveLength(3);
    expect(read.value.depiction.atoms[0]!.hydrogens).toBe(1);
    expect(read.value.depiction.bonds.filter((b) => b.order === 2)).toHaveLength(1);
  });
});
