import { BOLTZMANN, GAS_CONSTANT, PLANCK } from './constants.ts';

/** RT in J/mol at temperature T (K). */
export function rtJoules(temperatureK: number): number {
  return GAS_CONSTANT * temperatureK;
}

/** k_B T / h in s^-1 at temperature T (K). */
export function kbtOverH(temperatureK: number): number {
  return (BOLTZMANN * temperatureK) / PLANCK;
}
