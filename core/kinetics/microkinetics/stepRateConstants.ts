import { kbtOverH, rtJoules } from '../../units/index.ts';

/** Forward and reverse first-order rate constants of one step, s⁻¹. */
export interface StepConstants {
  kf: number;
  kr: number;
}

/**
 * Rate constants of one first-order step between two minima: forward by the Eyring
 * equation k_f = κ(k_BT/h)·exp(−ΔG‡/RT) (H. Eyring, J. Chem. Phys. 3, 107 (1935)), reverse by
 * detailed balance k_r = k_f·exp(ΔG/RT) with ΔG = G(product) − G(reactant), so that
 * k_f/k_r = K = exp(−ΔG/RT). Energies in J/mol.
 */
export function stepRateConstants(barrierJ: number, reactionJ: number, temperatureK: number, transmission = 1): StepConstants {
  const rt = rtJoules(temperatureK);
  const kf = transmission * kbtOverH(temperatureK) * Math.exp(-barrierJ / rt);
  // Written as one exponent so that k_r stays finite when k_f underflows (and vice versa).
  const kr = transmission * kbtOverH(temperatureK) * Math.exp((reactionJ - barrierJ) / rt);
  return { kf, kr };
}
