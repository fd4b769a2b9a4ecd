import { BOLTZMANN, GAS_CONSTANT, PLANCK, SPEED_OF_LIGHT } from '../../units/constants.ts';

/** How low modes are treated: plain harmonic, Grimme's entropy interpolation or Truhlar's frequency raise. */
export type QuasiHarmonicMethod = 'off' | 'grimme' | 'truhlar';

/** A quasi-harmonic setting with its cut-off (100 cm⁻¹ is common practice). */
export interface QuasiHarmonic { method: QuasiHarmonicMethod; cutoffCm1: number }

/** Grimme's average molecular moment of inertia, B_av = 10⁻⁴⁴ kg m² (Chem. Eur. J. 18, 9955 (2012)). */
export const GRIMME_B_AV = 1e-44;

/** Harmonic-oscillator entropy of one mode, J mol⁻¹ K⁻¹ (standard statistical mechanics). */
export function harmonicEntropy(cm1: number, temperatureK: number): number {
  const x = (PLANCK * SPEED_OF_LIGHT * 100 * cm1) / (BOLTZMANN * temperatureK);
  return GAS_CONSTANT * (x / Math.expm1(x) - Math.log(-Math.expm1(-x)));
}

/**
 * Entropy of a free rotor with the moment of inertia of a mode of this frequency,
 * μ = h/(8π²ν), damped by μ' = μ B_av/(μ + B_av): S_R = R[½ + ln((8π³μ'kT/h²)^½)]
 * (Grimme, Chem. Eur. J. 18, 9955 (2012), eqs. 4–6).
 */
export function freeRotorEntropy(cm1: number, temperatureK: number): number {
  const nu = SPEED_OF_LIGHT * 100 * cm1;
  const mu = PLANCK / (8 * Math.PI ** 2 * nu);
  const muEff = (mu * GRIMME_B_AV) / (mu + GRIMME_B_AV);
  return GAS_CONSTANT * (0.5 + 0.5 * Math.log((8 * Math.PI ** 3 * muEff * BOLTZMANN * temperatureK) / PLANCK ** 2));
}

/**
 * Grimme's quasi-RRHO entropy of one mode: w S_V + (1 − w) S_R with the damping
 * w = 1/(1 + (ν₀/ν)⁴) around the cut-off ν₀ (Chem. Eur. J. 18, 9955 (2012), eq. 7).
 */
export function grimmeEntropy(cm1: number, temperatureK: number, cutoffCm1: number): number {
  const w = 1 / (1 + (cutoffCm1 / cm1) ** 4);
  return w * harmonicEntropy(cm1, temperatureK) + (1 - w) * freeRotorEntropy(cm1, temperatureK);
}

/**
 * Truhlar's quasi-harmonic frequency: modes below the cut-off are raised to it for the
 * vibrational partition function (Ribeiro, Marenich, Cramer, Truhlar, J. Phys. Chem. B 115,
 * 14556 (2011); the treatment from memory of that paper).
 */
export function truhlarFrequency(cm1: number, cutoffCm1: number): number {
  return Math.max(cm1, cutoffCm1);
}
