import { AVOGADRO, CALORIE_J, ELEMENTARY_CHARGE, HARTREE_J, PLANCK, SPEED_OF_LIGHT } from './constants.ts';

/** Molar energy units Passline reads and writes. */
export const ENERGY_UNITS = ['kcal/mol', 'kJ/mol', 'eV', 'hartree', 'cm-1'] as const;
export type EnergyUnit = (typeof ENERGY_UNITS)[number];

/** J/mol carried by one of each unit (per particle units are scaled by N_A). */
const JOULES_PER_MOL: Record<EnergyUnit, number> = {
  'kcal/mol': 1000 * CALORIE_J,
  'kJ/mol': 1000,
  eV: ELEMENTARY_CHARGE * AVOGADRO,
  hartree: HARTREE_J * AVOGADRO,
  'cm-1': PLANCK * SPEED_OF_LIGHT * 100 * AVOGADRO,
};

/** Converts a molar energy between units. */
export function convertEnergy(value: number, from: EnergyUnit, to: EnergyUnit): number {
  if (from === to) return value;
  return (value * JOULES_PER_MOL[from]) / JOULES_PER_MOL[to];
}

/** Energy in J/mol. */
export function toJoulesPerMol(value: number, unit: EnergyUnit): number {
  return value * JOULES_PER_MOL[unit];
}

/** J/mol to the given unit. */
export function fromJoulesPerMol(joulesPerMol: number, unit: EnergyUnit): number {
  return joulesPerMol / JOULES_PER_MOL[unit];
}

/** Pretty unit text for axis titles and tables, e.g. "kcal mol⁻¹". */
export function unitLabel(unit: EnergyUnit): string {
  switch (unit) {
    case 'kcal/mol': return 'kcal mol⁻¹';
    case 'kJ/mol': return 'kJ mol⁻¹';
    case 'eV': return 'eV';
    case 'hartree': return 'Eₕ';
    case 'cm-1': return 'cm⁻¹';
  }
}

const UNIT_ALIASES: Record<string, EnergyUnit> = {
  'kcal/mol': 'kcal/mol', 'kcal mol-1': 'kcal/mol', kcal: 'kcal/mol', 'kcal/mole': 'kcal/mol',
  'kj/mol': 'kJ/mol', 'kj mol-1': 'kJ/mol', kj: 'kJ/mol',
  ev: 'eV',
  hartree: 'hartree', eh: 'hartree', 'e_h': 'hartree', au: 'hartree', 'a.u.': 'hartree',
  'cm-1': 'cm-1', 'cm^-1': 'cm-1', 'cm⁻¹': 'cm-1', wavenumber: 'cm-1',
};

/** Reads a unit written by a person ("kJ/mol", "Eh", "cm^-1"); undefined when unknown. */
export function parseEnergyUnit(text: string): EnergyUnit | undefined {
  return UNIT_ALIASES[text.trim().toLowerCase().replace(/\s+/g, ' ')];
}
