import { fromJoulesPerMol, type EnergyUnit } from '../units/energy.ts';

/** An energy in J/mol quoted for a finding in the display unit, e.g. "1.20 kcal/mol". */
export function quoteEnergy(joulesPerMol: number, unit: EnergyUnit = 'kJ/mol'): string {
  return `${fromJoulesPerMol(joulesPerMol, unit).toFixed(unit === 'hartree' ? 5 : 2)} ${unit}`;
}
