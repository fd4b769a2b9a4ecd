import type { Settings, Unit } from '../model/schema.ts';

/**
 * Fewest decimals for units whose step of one digit is much larger than a kcal/mol digit:
 * 6 for hartree (1 µEₕ ≈ 0.0006 kcal/mol) and 3 for eV (1 meV ≈ 0.02 kcal/mol), common
 * practice in computational chemistry reports.
 */
const AT_LEAST: Partial<Record<Unit, number>> = { hartree: 6, eV: 3 };

/**
 * Decimals for an energy shown in `unit`: the document's Decimals setting for kcal/mol,
 * kJ/mol and cm⁻¹ (as before), never fewer than 6 for hartree and 3 for eV, so one setting
 * made for kcal/mol cannot print "0.0 Eₕ". Every formatter of energies takes its decimals here.
 */
export function energyDecimals(settings: Pick<Settings, 'decimals'>, unit: Unit): number {
  return Math.max(settings.decimals, AT_LEAST[unit] ?? 0);
}
