import { ensembleFreeEnergyJ, ensemblePopulations } from '../thermo/ensemble.ts';
import { rtJoules } from '../units/index.ts';

/**
 * Product ratio [P_A]/[P_B] = exp(ΔΔG‡/RT) under kinetic (Curtin–Hammett) control, with
 * ΔΔG‡ = G(TS_B) − G(TS_A) in J/mol (IUPAC Gold Book "Curtin–Hammett principle").
 */
export function ratioFromDdg(ddgJ: number, temperatureK: number): number {
  return Math.exp(ddgJ / rtJoules(temperatureK));
}

/** ΔΔG‡ = RT ln r in J/mol for a product ratio r (inverse of `ratioFromDdg`). */
export function ddgFromRatio(ratio: number, temperatureK: number): number {
  return rtJoules(temperatureK) * Math.log(ratio);
}

/** Enantiomeric (or diastereomeric) excess (r − 1)/(r + 1) as a fraction, for er = r : 1. */
export function eeFromRatio(ratio: number): number {
  return (ratio - 1) / (ratio + 1);
}

/** ee = tanh(ΔΔG‡/2RT) as a fraction; same as `eeFromRatio(ratioFromDdg(ddg))` without overflow. */
export function eeFromDdg(ddgJ: number, temperatureK: number): number {
  return Math.tanh(ddgJ / (2 * rtJoules(temperatureK)));
}

// The Boltzmann sums are core/thermo's ensemble functions under their kinetics names.
/**
 * Boltzmann-weighted ensemble energy G_eff = −RT ln Σ_i exp(−G_i/RT) in J/mol (≤ min G_i),
 * summed in log space; alias of core/thermo's `ensembleFreeEnergyJ`. Throws for an empty
 * list or a non-finite energy (programmer error).
 */
export const boltzmannEnergy = ensembleFreeEnergyJ;

/** Boltzmann populations exp(−(G_i − G_eff)/RT) of an ensemble; they sum to 1 (core/thermo's `ensemblePopulations`). */
export const boltzmannPopulations = ensemblePopulations;
