import { logEyringRate } from '../eyring.ts';

/** Forward and reverse first-order rate constants of one step, s⁻¹. */
export interface StepConstants {
  kf: number;
  kr: number;
}

/**
 * Rate constants of one first-order step between two minima: forward by the Eyring
 * equation k_f = κ(k_BT/h)·exp(−ΔG‡/RT) (H. Eyring, J. Chem. Phys. 3, 107 (1935)), reverse by
 * detailed balance k_r = k_f·exp(ΔG/RT) with ΔG = G(product) − G(reactant), so that
 * k_f/k_r = K = exp(−ΔG/RT). Energies in J/mol; throws for T ≤ 0 (programmer error).
 */
export function stepRateConstants(barrierJ: number, reactionJ: number, temperatureK: number, transmission = 1): StepConstants {
  const kf = Math.exp(logEyringRate(barrierJ, temperatureK, transmission));
  // The reverse barrier ΔG‡ − ΔG as one exponent, so that k_r stays finite when k_f underflows (and vice versa).
  const kr = Math.exp(logEyringRate(barrierJ - reactionJ, temperatureK, transmission));
  return { kf, kr };
}
