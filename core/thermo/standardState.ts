import { ATM_PA, BAR_PA } from '../units/constants.ts';
import { rtJoules } from '../units/thermal.ts';

/** Standard pressure of gas-phase free energies. */
export type StandardPressure = '1atm' | '1bar';

/** c° = 1 mol/L in SI units (mol m⁻³). */
const ONE_MOLAR = 1000;

/**
 * Correction added to a species' gas-phase G (standard pressure p°) to move it to the
 * 1 mol/L solution standard state: ΔG° = RT ln(RT c°/p°), in J/mol.
 * Ideal-gas chemical potential μ = μ° + RT ln(p/p°) with p = cRT (Ben-Naim & Marcus,
 * J. Chem. Phys. 81, 2016 (1984)); REFERENCE.md §5.
 */
export function standardStateCorrectionJ(temperatureK: number, from: StandardPressure): number {
  const rt = rtJoules(temperatureK);
  const p0 = from === '1atm' ? ATM_PA : BAR_PA;
  return rt * Math.log((rt * ONE_MOLAR) / p0);
}

/**
 * Correction for a neat liquid (e.g. solvent water) whose G was computed at 1 mol/L:
 * G(neat) = G(1 M) + RT ln([S]/1 M), in J/mol (Bryantsev, Diallo, Goddard, J. Phys. Chem. B
 * 112, 9709 (2008); REFERENCE.md §5). 55.5 M for water is common practice; 55.34 M also appears.
 */
export function neatSolventCorrectionJ(temperatureK: number, concentrationMolL: number): number {
  if (!(concentrationMolL > 0)) throw new RangeError(`neat concentration must be positive, got ${concentrationMolL}`);
  return rtJoules(temperatureK) * Math.log(concentrationMolL);
}
