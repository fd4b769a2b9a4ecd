import { rtJoules } from '../units/thermal.ts';
import { logSumExp } from './logSumExp.ts';

function checkEnergies(energiesJ: readonly number[]): void {
  if (energiesJ.length === 0) throw new RangeError('an ensemble needs at least one energy');
  if (energiesJ.some((g) => !Number.isFinite(g))) throw new RangeError('ensemble energies must be finite');
}

/**
 * Boltzmann ensemble free energy G_eff = −RT ln Σ exp(−G_i/RT), in J/mol, by the
 * log-sum-exp shift so that absolute energies of 10⁸ J/mol do not underflow
 * (Boltzmann distribution, e.g. McQuarrie, Statistical Mechanics (1976)). G_eff ≤ min G_i.
 */
export function ensembleFreeEnergyJ(energiesJ: readonly number[], temperatureK: number): number {
  checkEnergies(energiesJ);
  const rt = rtJoules(temperatureK);
  // Shifted by min G in energy units first, so that one state gives exactly G_eff = G.
  const min = Math.min(...energiesJ);
  return min - rt * logSumExp(energiesJ.map((g) => -(g - min) / rt));
}

/** Boltzmann populations p_i = exp(−(G_i − G_eff)/RT); they sum to 1. */
export function ensemblePopulations(energiesJ: readonly number[], temperatureK: number): number[] {
  const geff = ensembleFreeEnergyJ(energiesJ, temperatureK);
  const rt = rtJoules(temperatureK);
  return energiesJ.map((g) => Math.exp(-(g - geff) / rt));
}
