import { kbtOverH, rtJoules } from '../../units/thermal.ts';

/** Options of the inverse Eyring equation. */
export interface InverseEyringOptions {
  /** Molecularity m of the step (1 = first order); k is in (mol/L)^(1−m) s⁻¹. */
  molecularity?: number;
  /** Transmission coefficient κ (default 1). */
  transmission?: number;
  /** Standard concentration c° in mol/L (default 1). */
  standardConcentration?: number;
}

/**
 * Free energy of activation from a rate constant, J/mol:
 * Δ‡G = RT ln[κ k_B T (c°)^(1−m) / (h k)] (Eyring, J. Chem. Phys. 3, 107 (1935); Evans & Polanyi,
 * Trans. Faraday Soc. 31, 875 (1935); IUPAC Gold Book 'Gibbs energy of activation').
 */
export function barrierFromRateConstantJ(k: number, temperatureK: number, options: InverseEyringOptions = {}): number {
  const m = options.molecularity ?? 1;
  const kappa = options.transmission ?? 1;
  const c0 = options.standardConcentration ?? 1;
  if (!(k > 0)) throw new RangeError(`rate constant must be positive, got ${k}`);
  return rtJoules(temperatureK) * Math.log((kappa * kbtOverH(temperatureK) * c0 ** (1 - m)) / k);
}

/**
 * Free energy of activation of a first-order step from its half-life t½ = ln 2 / k, J/mol:
 * Δ‡G = RT ln[κ k_B T t½ / (h ln 2)]. Only first order: for second order t½ depends on [A]₀.
 */
export function barrierFromHalfLifeJ(halfLifeSeconds: number, temperatureK: number, transmission = 1): number {
  if (!(halfLifeSeconds > 0)) throw new RangeError(`half-life must be positive, got ${halfLifeSeconds}`);
  return barrierFromRateConstantJ(Math.LN2 / halfLifeSeconds, temperatureK, { transmission });
}
