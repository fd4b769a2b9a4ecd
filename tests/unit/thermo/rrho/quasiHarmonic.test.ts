import { describe, expect, it } from 'vitest';
import { freeRotorEntropy, grimmeEntropy, harmonicEntropy, truhlarFrequency } from '../../../../core/thermo/rrho/quasiHarmonic.ts';

// The formulas re-derived here from the papers, written out with the CODATA 2018 exact constants.
const h = 6.62607015e-34, k = 1.380649e-23, NA = 6.02214076e23, c = 299792458;
const R = k * NA;

describe("Grimme's quasi-RRHO entropy (Chem. Eur. J. 18, 9955 (2012))", () => {
  it('is the harmonic entropy x/(eˣ − 1) − ln(1 − e⁻ˣ) for a stiff mode', () => {
    const x = (h * c * 100 * 1500) / (k * 298.15);
    expect(harmonicEntropy(1500, 298.15)).toBeCloseTo(R * (x / (Math.exp(x) - 1) - Math.log(1 - Math.exp(-x))), 12);
    expect(grimmeEntropy(1500, 298.15, 100)).toBeCloseTo(harmonicEntropy(1500, 298.15), 3);
  });

  it('blends in the free-rotor entropy with weight 1/(1 + (ν₀/ν)⁴) for a soft mode', () => {
    const nu = 30, T = 298.15, nu0 = 100;
    const mu = h / (8 * Math.PI ** 2 * (c * 100 * nu)); // eq. 4: moment of inertia of a rotor with this frequency
    const muPrime = (mu * 1e-44) / (mu + 1e-44); // eq. 5: B_av = 1e-44 kg m²
    const sR = R * (1 / 2 + Math.log(Math.sqrt((8 * Math.PI ** 3 * muPrime * k * T) / h ** 2))); // eq. 6
    const w = 1 / (1 + (nu0 / nu) ** 4); // eq. 7, α = 4
    expect(freeRotorEntropy(nu, T)).toBeCloseTo(sR, 10);
    expect(grimmeEntropy(nu, T, nu0)).toBeCloseTo(w * harmonicEntropy(nu, T) + (1 - w) * sR, 10);
    // At the cut-off both enter with weight ½.
    expect(grimmeEntropy(nu0, T, nu0)).toBeCloseTo((harmonicEntropy(nu0, T) + freeRotorEntropy(nu0, T)) / 2, 10);
    // The point of the method: a 10 cm⁻¹ mode's harmonic entropy is far larger than its quasi-RRHO one.
    expect(harmonicEntropy(10, T) - grimmeEntropy(10, T, nu0)).toBeGreaterThan(10);
  });
});

describe("Truhlar's quasi-harmonic raise (J. Phys. Chem. B 115, 14556 (2011))", () => {
  it('raises a mode below the cut-off to it and leaves the others', () => {
    expect(truhlarFrequency(35, 100)).toBe(100);
    expect(truhlarFrequency(250, 100)).toBe(250);
  });
});
