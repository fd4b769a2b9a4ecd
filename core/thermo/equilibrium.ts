import { GAS_CONSTANT } from '../units/constants.ts';
import { rtJoules } from '../units/thermal.ts';
import { assertTemperature } from './assertTemperature.ts';

/** ln K = −ΔrG°/RT (ΔrG° in J/mol, standard state 1 bar or 1 mol/L as the data are). Throws for T ≤ 0. */
export function lnEquilibriumConstant(deltaGJ: number, temperatureK: number): number {
  assertTemperature(temperatureK);
  return -deltaGJ / rtJoules(temperatureK);
}

/**
 * Equilibrium constant K = exp(−ΔrG°/RT) (ΔrG° in J/mol; IUPAC Green Book). Overflows to
 * Infinity beyond K ≈ 1e308; use {@link lnEquilibriumConstant} for such reactions.
 */
export function equilibriumConstant(deltaGJ: number, temperatureK: number): number {
  return Math.exp(lnEquilibriumConstant(deltaGJ, temperatureK));
}

/**
 * Van 't Hoff with constant ΔrH°: K(T2) = K(T1) exp[−(ΔrH°/R)(1/T2 − 1/T1)]
 * (van 't Hoff, Études de dynamique chimique (1884); REFERENCE.md §9).
 */
export function vantHoffK(k1: number, t1K: number, t2K: number, deltaHJ: number): number {
  return k1 * Math.exp((-deltaHJ / GAS_CONSTANT) * (1 / t2K - 1 / t1K));
}

/** Inverse van 't Hoff: ΔrH° (J/mol) from K at two temperatures, constant ΔrH° assumed. */
export function vantHoffEnthalpyJ(k1: number, t1K: number, k2: number, t2K: number): number {
  return (-GAS_CONSTANT * Math.log(k2 / k1)) / (1 / t2K - 1 / t1K);
}

/**
 * Crossover temperature T* = ΔrH°/ΔrS° where ΔrG° changes sign (K), or null unless ΔrH° and
 * ΔrS° have the same sign. Formal only: it assumes both are independent of T (ΔrCp = 0).
 */
export function crossoverTemperatureK(deltaHJ: number, deltaSJK: number): number | null {
  if (deltaHJ === 0 || deltaSJK === 0 || Math.sign(deltaHJ) !== Math.sign(deltaSJK)) return null;
  return deltaHJ / deltaSJK;
}
