/** Which reader produced a record. */
export type CalcProgram = 'gaussian' | 'orca' | 'xyz';

/** One atom of a geometry: element symbol and Cartesian position in ångström. */
export interface CalcAtom {
  symbol: string;
  x: number;
  y: number;
  z: number;
}

/** The thermochemistry a program printed itself (hartree per particle), with its conditions. */
export interface ProgramThermo {
  temperatureK: number;
  pressureAtm: number;
  zpe: number | null;
  /** Thermal correction to the energy (U − E_el), including the ZPE. */
  eCorrection: number | null;
  hCorrection: number | null;
  gCorrection: number | null;
  /** What the program says it used for the entropy of low modes ("harmonic", "Grimme qRRHO, 100 cm⁻¹"). */
  entropyModel: string;
}

/** How the run ended, as far as the text shows. */
export type Termination = 'normal' | 'abnormal' | 'truncated';

/** Whether a geometry optimisation ran and converged. */
export type Optimisation = 'converged' | 'not-converged' | 'none';

/**
 * What a reader found in one output file, and what it did not find. Every field is either
 * read from the text or null; nothing is guessed. `missing` names, in words, what a user
 * would expect and the file does not hold.
 */
export interface CalcRecord {
  program: CalcProgram;
  /** Program version as printed ("Gaussian 16 A.03", "ORCA 6.0.1"), or null. */
  version: string | null;
  /** The method line of the final energy: route or keyword line as written ("b3lyp/sto-3g"). */
  method: string | null;
  /** Final electronic energy in hartree (last one printed: multi-step jobs end on their result). */
  energyHartree: number | null;
  /** The program's label of that energy ("E(RB3LYP)", "FINAL SINGLE POINT ENERGY"). */
  energyLabel: string | null;
  charge: number | null;
  multiplicity: number | null;
  /** Final geometry. */
  atoms: CalcAtom[] | null;
  /** Hill formula of the final geometry ("C10H10"). */
  formula: string | null;
  /** Harmonic frequencies in cm⁻¹, imaginary ones negative; null when the file has none. */
  frequencies: number[] | null;
  thermo: ProgramThermo | null;
  symmetryNumber: number | null;
  termination: Termination;
  optimisation: Optimisation;
  missing: string[];
  /** Things read that the user should know (e.g. "2 frequency blocks; the last is used"). */
  notes: string[];
}

/** Number of imaginary frequencies (printed as negative numbers), or null without frequencies. */
export function imaginaryCount(record: Pick<CalcRecord, 'frequencies'>): number | null {
  return record.frequencies === null ? null : record.frequencies.filter((f) => f < 0).length;
}
