import { describe, expect, it } from 'vitest';
import { makeDocument, validateDocument } from '../../../core/model/load.ts';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { logNormalShift, perturbDocument } from '../../../core/uncertainty/perturbDocument.ts';
import { describeSigma, uncertainInputs } from '../../../core/uncertainty/uncertainInputs.ts';
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

describe('σ on rate constants and half-lives', () => {
  const ts = (estimate: object) => ({ id: 'T', label: 'T', kind: 'ts' as const, energy: { mode: 'estimate' as const, estimate: estimate as never } });
  const withEstimate = (estimate: object) => onePathway([typed('R', 'min', 0), ts(estimate), typed('P', 'min', -3)]);
  const raw = (estimate: object) => ({ format: 'passline', version: 3, pathways: [{ id: 'a', name: 'A', points: [{ id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } }, ts(estimate)] }] });

  it('lists kSigma, secondsSigma and each point\'s kSigma as log-normal inputs in their own units', () => {
    expect(uncertainInputs(withEstimate({ method: 'rateConstant', k: 2, kSigma: 0.5, molecularity: 2 })).map((i) => [i.key, i.sigma, i.unit, i.distribution])).toEqual([['a/T/k', 0.5, 'M⁻¹ s⁻¹', 'logNormal']]);
    expect(uncertainInputs(withEstimate({ method: 'halfLife', seconds: 60, secondsSigma: 6 })).map(describeSigma)).toEqual(['σ 6 s']);
    const fit = withEstimate({ method: 'arrhenius', data: [{ temperatureK: 300, k: 1, kSigma: 0.1 }, { temperatureK: 320, k: 3 }, { temperatureK: 340, k: 8, kSigma: 0 }] });
    expect(uncertainInputs(fit).map((i) => [i.key, i.label])).toEqual([['a/T/data 0/k', 'T (A): k at 300 K']]);
  });

  it('perturbDocument multiplies by exp(δ/value) and copies only what it changes', () => {
    const doc = withEstimate({ method: 'eyringFit', data: [{ temperatureK: 300, k: 1, kSigma: 0.1 }, { temperatureK: 320, k: 3, kSigma: 0.3 }] });
    const moved = perturbDocument(doc, uncertainInputs(doc), [0.2, -0.3]);
    const est = moved.pathways[0]!.points[1]!.energy;
    expect(est.mode === 'estimate' && est.estimate.method === 'eyringFit' && est.estimate.data.map((p) => p.k)).toEqual([Math.exp(0.2), 3 * Math.exp(-0.1)]);
    expect(doc.pathways[0]!.points[1]!.energy).toMatchObject({ estimate: { data: [{ k: 1 }, { k: 3 }] } });
    expect(logNormalShift(5, 0)).toBe(5);
  });

  it('refuses a negative σ or one beyond ten times the value, naming the field and the bound', () => {
    const neg = validateDocument(raw({ method: 'halfLife', seconds: 10, secondsSigma: -1 }));
    expect(!neg.ok && neg.errors[0]).toMatchObject({ path: 'pathways[0].points[1].energy.estimate.secondsSigma', message: 'expected a standard uncertainty ≥ 0 in s' });
    const big = validateDocument(raw({ method: 'eyringFit', data: [{ temperatureK: 300, k: 1 }, { temperatureK: 310, k: 2, kSigma: 200 }] }));
    expect(!big.ok && big.errors[0]).toMatchObject({ path: 'pathways[0].points[1].energy.estimate.data[1].kSigma', message: 'kSigma 200 with k 2: relative uncertainty σ/value 100 is outside 0 to 10' });
    expect(validateDocument(raw({ method: 'rateConstant', k: 1e-3, kSigma: 1e-4 })).ok).toBe(true);
  });
});
