import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import { startConformerUncertainty } from '../../../core/uncertainty/conformerUncertainty.ts';
import { rtJoules } from '../../../core/units/thermal.ts';

// 1 Eh = 627.5094740630558 kcal/mol (CODATA 2018), 1 kcal = 4184 J (NIST SP 811); z₀.₉₇₅ = 1.959964
// (normal quantile). Two conformers of equal G, each E with σ = 1 kcal/mol: ΔE = E₂ − E₁ ~ N(0, 2σ²),
// and p₁ = 1/(1 + exp(ΔE/RT)) is monotone in ΔE, so its percentiles are p₁ at ΔE = ∓1.959964·σ√2 exactly.
const SIGMA_EH = 1 / 627.5094740630558;
const doc = (sigma: number | undefined, speciesSigma?: number) => makeDocument({
  settings: speciesSigma === undefined ? {} : { uncertainty: { defaultSigma: speciesSigma, defaultSigmaUnit: 'kcal/mol' } },
  species: [{ id: 'sa', label: 'SA', structures: [
    { label: 'a', electronic: -400.1, gCorrection: 0.2, ...(sigma === undefined ? {} : { sigma }) },
    { label: 'b', electronic: -400.1, gCorrection: 0.2, ...(sigma === undefined ? {} : { sigma }) },
  ] }],
  pathways: [{ id: 'p', name: 'Route', points: [{ id: 'a', label: 'A', kind: 'min', energy: { mode: 'species', terms: [{ species: 'sa', count: 1 }] } }] }],
} as never);

const run = (d: ReturnType<typeof doc>, samples: number, seed: number) => {
  const r = startConformerUncertainty(d, 'sa', { samples, seed });
  r.step(samples);
  return r.result();
};

describe('conformer population intervals', () => {
  it('match the logistic of the normal quantiles of the energy gap', () => {
    const result = run(doc(SIGMA_EH), 20000, 3);
    const x = (1.959964 * Math.SQRT2 * 4184) / rtJoules(298.15);
    const [a] = result.populations;
    expect(a!.median).toBeCloseTo(0.5, 1);
    expect(a!.high).toBeCloseTo(1 / (1 + Math.exp(-x)), 2);
    expect(a!.low).toBeCloseTo(1 / (1 + Math.exp(x)), 2);
    expect(result.samples).toBe(20000);
    expect(result.inputs).toHaveLength(2);
  });

  it('a σ on the species as a whole moves both conformers alike: no spread, no inputs of its own', () => {
    const result = run(doc(undefined, 2), 500, 1);
    expect(result.inputs).toEqual([]);
    for (const p of result.populations) {
      expect(p!.high).toBe(p!.low);
      expect(p!.median).toBeCloseTo(0.5, 10);
    }
  });

  it('draws the same deviates for one seed, and others for another', () => {
    expect(run(doc(SIGMA_EH), 300, 7)).toEqual(run(doc(SIGMA_EH), 300, 7));
    expect(run(doc(SIGMA_EH), 300, 8).populations[0]!.high).not.toBe(run(doc(SIGMA_EH), 300, 7).populations[0]!.high);
  });
});
