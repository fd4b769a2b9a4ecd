import { assertTemperature } from '../thermo/assertTemperature.ts';
import { kbtOverH, rtJoules } from '../units/index.ts';
import type { Molecularity } from './types.ts';

/** Unit of a rate constant for molecularity m with concentrations in mol/L. */
export type RateUnit = 's⁻¹' | 'M⁻¹ s⁻¹' | 'M⁻² s⁻¹';

const UNITS: Record<Molecularity, RateUnit> = { 1: 's⁻¹', 2: 'M⁻¹ s⁻¹', 3: 'M⁻² s⁻¹' };

/** The unit of k for a step of molecularity m, (mol/L)^(1−m) s⁻¹. */
export function rateUnit(molecularity: Molecularity): RateUnit {
  return UNITS[molecularity];
}

/**
 * Natural log of the Eyring rate constant, ln k = ln(κ k_B T/h) + (1−m) ln c° − ΔG‡/RT
 * (Eyring, J. Chem. Phys. 3, 107 (1935); IUPAC Gold Book "transition state theory").
 * With c° = 1 mol/L the (c°)^(1−m) factor is 1 in M-based units: m changes only the unit.
 * Stays finite where k itself would underflow.
 */
export function logEyringRate(barrierJ: number, temperatureK: number, transmission = 1): number {
  assertTemperature(temperatureK);
  return Math.log(transmission * kbtOverH(temperatureK)) - barrierJ / rtJoules(temperatureK);
}

/** A rate constant with its natural log and unit. */
export interface RateConstant {
  k: number;
  /** ln k in the unit below. */
  logK: number;
  unit: RateUnit;
}

/** Eyring rate constant k = κ (k_B T/h)(c°)^(1−m) exp(−ΔG‡/RT), ΔG‡ in J/mol in the 1 mol/L standard state. */
export function eyringRate(
  barrierJ: number,
  temperatureK: number,
  options: { transmission?: number; molecularity?: Molecularity } = {},
): RateConstant {
  const logK = logEyringRate(barrierJ, temperatureK, options.transmission ?? 1);
  return { k: Math.exp(logK), logK, unit: rateUnit(options.molecularity ?? 1) };
}

/** First-order half-life t½ = ln 2 / k in s; Infinity for k = 0. */
export function halfLifeFirstOrder(k: number): number {
  return Math.LN2 / k;
}

// K and ln K live in core/thermo; re-exported as the same bindings so that the kinetics and
// thermo indexes can be star-exported together without a name clash.
/** Equilibrium constant K = exp(−ΔG/RT), ΔG in J/mol (core/thermo's implementation). */
export { equilibriumConstant } from '../thermo/equilibrium.ts';
/** ln K = −ΔG/RT, finite where K over- or underflows (core/thermo's `lnEquilibriumConstant`). */
export { lnEquilibriumConstant as logEquilibriumConstant } from '../thermo/equilibrium.ts';
