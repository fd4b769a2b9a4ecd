import { describe, expect, it } from 'vitest';
import { makeDocument, validateDocument } from '../../../core/model/load.ts';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { perturbDocument } from '../../../core/uncertainty/perturbDocument.ts';
import { uncertainInputs } from '../../../core/uncertainty/uncertainInputs.ts';
import { onePathway, species, state, typed } from '../profile/builders.ts';

describe('uncertainInputs', () => {
  it('the default σ covers typed values, steps and species but not the reference value, and never overrides σ = 0', () => {
    const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20, { energy: { mode: 'barrier', value: 20, unit: 'kcal/mol' } }), typed('P', 'min', -5, { energy: { mode: 'value', value: -5, unit: 'kcal/mol', sigma: 0 } })], {
      settings: { uncertainty: { defaultSigma: 4, defaultSigmaUnit: 'kJ/mol' } },
    });
    expect(uncertainInputs(doc).map((i) => [i.key, i.sigma, i.unit, i.isDefault, i.sigmaJ])).toEqual([['a/TS/value', 4, 'kJ/mol', true, 4000]]);
  });

  it('off by default: without a stated default σ only entered σ count', () => {
    const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20)]);
    expect(uncertainInputs(doc)).toEqual([]);
  });

  it('species energies, thermal corrections, formation values and BEP E₀ each carry their own σ', () => {
    const doc = onePathway([
      state('S', 'min', [['x', 1]]),
      { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'bep', e0: 15, alpha: 0.4, unit: 'kcal/mol', e0Sigma: 1 } } },
      state('S2', 'min', [['y', 1]]),
    ], {
      species: [
        species('x', -100, { structures: [{ electronic: -0.16, gCorrection: 0.01, hCorrection: 0.02, sigma: 0.001, correctionSigma: 0.0005 }] }),
        species('y', -110, { formation: { dfG: -50, dfGSigma: 0.4 } }),
      ],
    });
    expect(uncertainInputs(doc).map((i) => [i.label, i.sigma, i.unit])).toEqual([
      ['T (A): BEP E₀', 1, 'kcal/mol'],
      ['x: energy', 0.001, 'hartree'],
      ['x: thermal correction', 0.0005, 'hartree'],
      ['y: ΔfG°', 0.4, 'kJ/mol'],
    ]);
  });
});

describe('perturbDocument', () => {
  it('adds each deviation where it was entered and leaves the original alone', () => {
    const doc = onePathway([state('S1', 'min', [['x', 1]]), state('S2', 'min', [['x', 1], ['y', 1]])], {
      species: [species('x', -100, { structures: [{ electronic: -0.2, gCorrection: 0.01, sigma: 0.001, correctionSigma: 0.001 }] }), species('y', -50, { structures: [{ electronic: -0.1, gCorrection: 0, sigma: 0.002 }] })],
    });
    const inputs = uncertainInputs(doc);
    const moved = perturbDocument(doc, inputs, [0.001, 0.002, -0.003]);
    expect(moved.species[0]!.structures[0]).toMatchObject({ electronic: -0.199, gCorrection: 0.012 });
    expect(moved.species[1]!.structures[0]!.electronic).toBeCloseTo(-0.103, 12);
    expect(doc.species[0]!.structures[0]!.electronic).toBe(-0.2);
    // x appears in both states and cancels; S2 − S1 moves by y's deviation only (hartree → kJ/mol, CODATA 2018: 2625.499639 kJ/mol per hartree).
    const shift = analyseDocument(moved).profile.pathways[0]!.points[1]!.energyJ! - analyseDocument(doc).profile.pathways[0]!.points[1]!.energyJ!;
    expect(shift / 1000).toBeCloseTo(-0.003 * 2625.499639479825, 6);
  });
});

describe('schema: σ fields', () => {
  it('refuses a negative σ and names where it is', () => {
    const result = validateDocument({ format: 'passline', version: 2, pathways: [{ id: 'a', name: 'A', points: [{ id: 'p', label: 'P', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol', sigma: -1 } }] }] });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toMatchObject({ path: expect.stringContaining('sigma'), message: 'expected a standard uncertainty ≥ 0' });
  });

  it('keeps the Monte Carlo settings and seed with the document', () => {
    const doc = makeDocument({ settings: { uncertainty: { seed: 77 } } });
    expect(doc.settings.uncertainty).toEqual({ defaultSigmaUnit: 'kcal/mol', samples: 10_000, seed: 77 });
  });
});
