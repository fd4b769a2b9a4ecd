import { describe, expect, it } from 'vitest';
import { checkCalculations } from '../../../core/profile/checks/calculationChecks.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import type { DocumentInput, SourceFile } from '../../../core/model/schema.ts';
import { onePathway, state } from './builders.ts';

type SpeciesInput = NonNullable<DocumentInput['species']>[number];

const file = (name: string, extra: Partial<SourceFile> = {}): SourceFile => ({ file: name, role: 'energy+corrections', program: 'Gaussian 16 A.03', method: 'b3lyp/def2svp', termination: 'normal', optimisation: 'converged', ...extra });

/** A species read from one output file (numbers invented for these tests). */
function calc(id: string, frequencies: number[], extra: Partial<SpeciesInput> = {}, src: Partial<SourceFile> = {}): SpeciesInput {
  return {
    id, label: id, charge: 0, multiplicity: 1, correctionTemperatureK: 298.15,
    structures: [{ electronic: -100, hCorrection: 0.1, gCorrection: 0.05, frequencies, source: { files: [file(`${id}.log`, src)] } }],
    ...extra,
  };
}

const codes = (doc: ReturnType<typeof onePathway>) => checkCalculations({ doc, pathways: [], ctx: undefined as never }).map((f) => f.code);
const messages = (doc: ReturnType<typeof onePathway>) => checkCalculations({ doc, pathways: [], ctx: undefined as never }).map((f) => f.message);
const step = (species: SpeciesInput[], kinds: ('min' | 'ts')[] = ['min', 'ts', 'min']) =>
  onePathway(kinds.map((k, i) => state(`p${i}`, k, [[species[i]!.id, 1]])), { species });

describe('checkCalculations', () => {
  it('finds nothing for a clean min – TS – min step', () => {
    expect(codes(step([calc('a', [120, 900]), calc('ts', [-450, 300]), calc('b', [80, 1000])]))).toEqual([]);
  });

  it('wants exactly one imaginary frequency at a TS, naming the file', () => {
    expect(messages(step([calc('a', [120]), calc('ts', [-450, -80, 300]), calc('b', [80])]))).toEqual([
      'transition state "p1" has 2 imaginary frequencies, expected exactly 1: ts.log (450i, 80i)',
    ]);
    expect(codes(step([calc('a', [120]), calc('ts', [60, 300]), calc('b', [80])]))).toEqual(['ts-imaginary-count']);
  });

  it('counts the TS species of a state with spectators once', () => {
    const species = [calc('a', [120]), calc('ts', [-450, 300]), calc('spect', [200]), calc('b', [80])];
    const doc = onePathway([state('p0', 'min', [['a', 1], ['spect', 1]]), state('p1', 'ts', [['ts', 1], ['spect', 1]]), state('p2', 'min', [['b', 1], ['spect', 1]])], { species });
    expect(codes(doc)).toEqual([]);
  });

  it('flags imaginary modes on a minimum: below 50 cm⁻¹ a warning (common practice), above an error', () => {
    const small = checkCalculations({ doc: step([calc('a', [-22, 120]), calc('ts', [-450]), calc('b', [80])]), pathways: [], ctx: undefined as never });
    expect(small).toMatchObject([{ severity: 'warning', code: 'minimum-small-imaginary', point: 'p0' }]);
    expect(small[0]!.message).toContain('a.log (22i)');
    const large = checkCalculations({ doc: step([calc('a', [120]), calc('ts', [-450]), calc('b', [-130, 80])]), pathways: [], ctx: undefined as never });
    expect(large).toMatchObject([{ severity: 'error', code: 'minimum-imaginary', point: 'p2' }]);
  });

  it('reports a non-converged optimisation, an error termination and a cut-off file by name', () => {
    const doc = step([calc('a', [120], {}, { optimisation: 'not-converged' }), calc('ts', [-450], {}, { termination: 'abnormal' }), calc('b', [80], {}, { termination: 'truncated' })]);
    expect(messages(doc)).toEqual([
      'a.log (species "a"): the geometry optimisation did not converge',
      'ts.log (species "ts"): the run ended with an error',
      'b.log (species "b"): the output ends before the program\'s termination line',
    ]);
  });

  it('reports a charge or spin that changes within a step', () => {
    const doc = step([calc('a', [120]), calc('ts', [-450], { charge: 1 }), calc('b', [80], { charge: 1, multiplicity: 3 })]);
    expect(messages(doc)).toEqual([
      'total charge changes from 0 at "p0" (a.log) to 1 at "p1" (ts.log)',
      'spin changes between "p1" (ts.log, 0 unpaired electrons) and "p2" (b.log, 2); intended only for a spin crossover',
    ]);
  });

  it('reports mixed methods across the profile, grouping the files (case and separators ignored)', () => {
    const doc = step([calc('a', [120], {}, { method: 'B3LYP/def2SVP' }), calc('ts', [-450], {}, { method: 'b3lyp def2svp' }), calc('b', [80], {}, { method: 'pbe0/def2tzvp' })]);
    expect(messages(doc)).toEqual([
      'electronic energies come from 2 different methods or basis sets: B3LYP/def2SVP (a.log, ts.log); pbe0/def2tzvp (b.log)',
      'thermal corrections come from 2 different methods or basis sets: B3LYP/def2SVP (a.log, ts.log); pbe0/def2tzvp (b.log)',
    ]);
  });

  it('reports corrections from different temperatures', () => {
    const doc = step([calc('a', [120]), calc('ts', [-450], { correctionTemperatureK: 353.15 }), calc('b', [80])]);
    expect(messages(doc)).toEqual(['thermal corrections are at 2 different temperatures: 298.15 K (a.log, b.log); 353.15 K (ts.log)']);
  });

  it('joins the consistency checks of the resolved profile', () => {
    const doc = step([calc('a', [120]), calc('ts', [-450, -80]), calc('b', [80])]);
    expect(resolveProfile(doc).findings.map((f) => f.code)).toContain('ts-imaginary-count');
  });
});
