import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { loadStructureToolkit } from '../../../core/structure/loadStructureToolkit.ts';
import { pointDepictions } from '../../../core/structure/pointDepictions.ts';
import { hasStructures, pointKey, readStructures } from '../../../core/structure/readStructures.ts';
import { withStructureFormulas } from '../../../core/structure/withStructureFormulas.ts';
import { onePathway, species, state } from '../profile/builders.ts';

const toolkit = await loadStructureToolkit();
// OpenChemLib's first layout is slow (it starts its templates): do it before the timed tests.
toolkit.read({ format: 'smiles', text: 'c1ccccc1' });
const smiles = (text: string) => ({ format: 'smiles' as const, text });

// Invented scenario: ester hydrolysis by hydroxide, CH3COOCH3 + OH⁻ → CH3COO⁻ + CH3OH
// (formulas as in PubChem: methyl acetate C3H6O2, acetate C2H3O2⁻, methanol CH4O; from memory).
const hydrolysis = (products: [string, number][], extra: { formula?: string; charge?: number } = {}) => onePathway([
  state('ester + OH-', 'min', [['ester', 1], ['hydroxide', 1]]),
  state('products', 'min', products),
], {
  species: [
    species('ester', -10, { molecule: smiles('CC(=O)OC'), ...extra }),
    species('hydroxide', -5, { molecule: smiles('[OH-]') }),
    species('acetate', -20, { molecule: smiles('CC(=O)[O-]') }),
    species('methanol', -8, { molecule: smiles('CO') }),
    species('water', -3, { molecule: smiles('O') }),
  ],
});

// The toolkit's layouts take seconds on a busy machine.
describe('structure formulas in the analysis', { timeout: 30_000 }, () => {
  it('balances a mechanism whose species carry only SMILES (no typed formulas)', () => {
    const doc = hydrolysis([['acetate', 1], ['methanol', 1]]);
    const analysis = analyseDocument(doc, readStructures(doc, toolkit));
    expect(analysis.findings.filter((f) => /imbalance|structure/.test(f.code))).toEqual([]);
  });

  it('finds the imbalance the structures reveal (water instead of methanol)', () => {
    const doc = hydrolysis([['acetate', 1], ['water', 1]]);
    const analysis = analyseDocument(doc, readStructures(doc, toolkit));
    expect(analysis.findings.find((f) => f.code === 'mass-imbalance')?.message).toBe('"products" has 1 fewer C, 2 fewer H than the reference "ester + OH-"');
    // Without the toolkit's reading there are no formulas, so no mass-balance finding.
    expect(analyseDocument(doc).findings.some((f) => f.code === 'mass-imbalance')).toBe(false);
  });

  it('reports a typed formula that disagrees with the structure, and uses the structure’s', () => {
    const doc = hydrolysis([['acetate', 1], ['methanol', 1]], { formula: 'C3H8O2' });
    const table = readStructures(doc, toolkit);
    const finding = analyseDocument(doc, table).findings.find((f) => f.code === 'structure-formula-mismatch');
    expect(finding?.message).toBe('species "ester": the typed formula C3H8O2 has 2 more H than the structure (C3H6O2); the structure\'s formula is used');
    expect(withStructureFormulas(doc, table).species[0]!.formula).toBe('C3H6O2');
  });

  it('reports a typed charge that disagrees with the structure', () => {
    const doc = hydrolysis([['acetate', 1], ['methanol', 1]], { formula: 'C3H6O2', charge: 1 });
    const finding = analyseDocument(doc, readStructures(doc, toolkit)).findings.find((f) => f.code === 'structure-charge-mismatch');
    expect(finding?.message).toBe('species "ester": the typed charge +1 disagrees with the structure\'s 0; the structure\'s charge is used');
  });

  it('turns an unreadable structure into an error finding naming the species', () => {
    const doc = onePathway([state('x', 'min', [['bad', 1]])], { species: [species('bad', 0, { molecule: smiles('C1CC(') })] });
    const finding = analyseDocument(doc, readStructures(doc, toolkit)).findings.find((f) => f.code === 'bad-structure');
    expect(finding?.message).toMatch(/^species "bad": the structure cannot be read \(SMILES: /);
  });
});

describe('pointDepictions', () => {
  it('draws the point’s own structure, else its largest species, on the chosen side', () => {
    const doc = hydrolysis([['acetate', 1], ['water', 1]]);
    doc.pathways[0]!.points[1]!.moleculeSide = 'below';
    expect(hasStructures(doc)).toBe(true);
    const drawings = pointDepictions(doc, readStructures(doc, toolkit));
    const first = drawings.get(pointKey('a', 'ester + OH-'))!;
    expect(first.side).toBe('above');
    expect(first.depiction.atoms.map((a) => a.element).sort()).toEqual(['C', 'C', 'C', 'O', 'O']);
    expect(drawings.get(pointKey('a', 'products'))!.side).toBe('below');
  });

  it('reads each molecule once across edits that keep it', () => {
    let calls = 0;
    const counting = { name: 'counting', read: (m: Parameters<typeof toolkit.read>[0]) => (calls++, toolkit.read(m)) };
    const doc = hydrolysis([['acetate', 1], ['methanol', 1]]);
    readStructures(doc, counting);
    readStructures({ ...doc, title: 'edited' }, counting);
    expect(calls).toBe(5);
  });
});
