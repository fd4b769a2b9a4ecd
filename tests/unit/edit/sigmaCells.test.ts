import { describe, expect, it } from 'vitest';
import { pasteSpecies, setSpeciesCell } from '../../../core/edit/speciesEdits.ts';
import { setConformerCell } from '../../../core/edit/conformerEdits.ts';
import { sigmaProblem } from '../../../core/edit/sigmaProblem.ts';
import { setSettings } from '../../../core/edit/settingsEdits.ts';
import { uncertainInputs } from '../../../core/uncertainty/uncertainInputs.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

// twoRoutes: species a (E −100 Eh) and b, invented (tests/unit/edit/fixture.ts).
describe('σ cells of the species sheet', () => {
  it('σ E and σ correction go on the first conformer, σ ΔfH° and σ ΔfG° on the formation data, in the column’s unit', () => {
    let doc = twoRoutes();
    for (const [column, text] of [['sigma', '0.0016'], ['correctionSigma', '0.0004'], ['dfH', '-52.3'], ['dfHSigma', '1.2'], ['dfGSigma', '0.8']] as const) {
      const edit = setSpeciesCell(doc, { row: 0, column, text });
      expect(edit.errors).toEqual([]);
      doc = edit.doc;
    }
    expect(doc.species[0]!.structures[0]).toEqual({ electronic: -100, sigma: 0.0016, correctionSigma: 0.0004 });
    expect(doc.species[0]!.formation).toEqual({ dfH: -52.3, dfHSigma: 1.2, dfGSigma: 0.8 });
    expectLoadable(doc);
    // The σ reach the Monte Carlo as entered, in hartree and kJ/mol.
    const inputs = uncertainInputs(doc).map((i) => [i.key, i.sigma, i.unit]);
    expect(inputs).toEqual([
      ['species a/0/energy', 0.0016, 'hartree'], ['species a/0/correction', 0.0004, 'hartree'], ['species a/dfH', 1.2, 'kJ/mol'],
    ]);
  });

  it('editing another cell keeps the σ; emptying a σ cell removes it', () => {
    let doc = setSpeciesCell(twoRoutes(), { row: 0, column: 'sigma', text: '0.002' }).doc;
    doc = setSpeciesCell(doc, { row: 0, column: 'electronic', text: '-100.5' }).doc;
    expect(doc.species[0]!.structures[0]).toEqual({ electronic: -100.5, sigma: 0.002 });
    doc = setSpeciesCell(doc, { row: 0, column: 'sigma', text: '' }).doc;
    expect(doc.species[0]!.structures[0]).toEqual({ electronic: -100.5 });
  });

  it.each([
    ['-0.001', 'expected a standard uncertainty ≥ 0, got -0.001'],
    ['abc', 'expected a number in Eh'],
    ['1e400', 'expected a number in Eh'],
    // 4 Eh = 10 502 kJ/mol (1 Eh = 2625.4996 kJ/mol, CODATA 2018), past the 10 000 kJ/mol limit.
    ['4', 'standard uncertainty σ 10501.998 kJ/mol is outside 0 to 10000 kJ/mol'],
  ])('a bad σ (%s) is refused with the column named and the document unchanged', (text, message) => {
    const doc = twoRoutes();
    const edit = setSpeciesCell(doc, { row: 0, column: 'sigma', text });
    expect(edit.doc).toBe(doc);
    expect(edit.errors).toHaveLength(1);
    expect(edit.errors[0]).toMatchObject({ row: 0, column: 'sigma' });
    expect(edit.errors[0]!.message.replace(/(\d+\.\d{3})\d+/, '$1')).toBe(message);
  });

  it('a σ needs the energy it belongs to', () => {
    const doc = twoRoutes();
    // Species b has no conformer, so no energy to qualify.
    const edit = setSpeciesCell(doc, { row: 1, column: 'sigma', text: '0.001' });
    expect(edit.doc).toBe(doc);
    expect(edit.errors[0]).toMatchObject({ column: 'electronic', message: expect.stringMatching(/when a single point, a correction or a σ is given/) });
  });

  it('a pasted header “sigma” fills σ E, and a block without a header still fills the columns in their old order', () => {
    const headed = pasteSpecies(twoRoutes(), { text: 'label\tE\tsigma\nA\t-100.25\t0.0015\n', row: 0, column: 'id' });
    expect(headed.errors).toEqual([]);
    expect(headed.doc.species[0]!.structures[0]).toEqual({ electronic: -100.25, sigma: 0.0015 });
    const plain = pasteSpecies(twoRoutes(), { text: '-100.1\t\t0.01\t0.02\t-50\t100\t-40', row: 0, column: 'electronic' });
    expect(plain.errors).toEqual([]);
    expect(plain.doc.species[0]!.formation).toEqual({ dfH: -50, S: 100, dfG: -40 });
  });

  it('the default σ is what an empty species σ leaves to the document', () => {
    const doc = setSettings(twoRoutes(), { uncertainty: { defaultSigma: 1, defaultSigmaUnit: 'kcal/mol', samples: 100, seed: 1 } });
    expect(uncertainInputs(doc).some((i) => i.key === 'species a/energy' && i.isDefault)).toBe(true);
    const own = setSpeciesCell(doc, { row: 0, column: 'sigma', text: '0' }).doc;
    // σ 0 typed: taken as exact, the default no longer applies.
    expect(uncertainInputs(own).some((i) => i.key.startsWith('species a/'))).toBe(false);
  });
});

describe('σ cells of a conformer', () => {
  it('each conformer takes its own σ; a negative one names the column', () => {
    const doc = twoRoutes();
    const ok = setConformerCell(doc, { species: 'a', row: 0, column: 'correctionSigma', text: '0.0003' });
    expect(ok.errors).toEqual([]);
    expect(ok.doc.species[0]!.structures[0]).toEqual({ electronic: -100, correctionSigma: 0.0003 });
    const bad = setConformerCell(ok.doc, { species: 'a', row: 0, column: 'sigma', text: '−1' });
    expect(bad.doc).toBe(ok.doc);
    expect(bad.errors.map((e) => e.message)).toEqual(['σ(E): expected a standard uncertainty ≥ 0, got -1']);
  });
});

describe('sigmaProblem', () => {
  it('reads the one bound table in kJ/mol whatever the unit', () => {
    expect(sigmaProblem(0, 'kcal/mol')).toBeNull();
    expect(sigmaProblem(2390, 'kcal/mol')).toBeNull();
    // 2400 kcal/mol × 4.184 = 10 041.6 kJ/mol (NIST SP 811 App. B.8) > 10 000.
    expect(sigmaProblem(2400, 'kcal/mol', 'σ')).toBe('σ: standard uncertainty σ 10041.6 kJ/mol is outside 0 to 10000 kJ/mol');
    expect(sigmaProblem(Number.NaN, 'eV')).toBe('expected a standard uncertainty ≥ 0, got NaN');
  });
});
