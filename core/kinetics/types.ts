import type { EnergyUnit } from '../units/energy.ts';
/** A point named by its id and label, as results refer to it. */
export interface PointRef {
  id: string;
  label: string;
}

/** Molecularity of an elementary step: the number of species that meet in its TS. */
export type Molecularity = 1 | 2 | 3;

/**
 * Molecularity of one step: one number for the forward direction (reverse 1), or both.
 * A bimolecular addition A + B → C is `{ forward: 2, reverse: 1 }`.
 */
export type StepMolecularity = number | { forward: number; reverse: number };

/** Conditions shared by every kinetic analysis. */
export interface KineticsOptions {
  /** Temperature in K. */
  temperatureK: number;
  /** Transmission coefficient κ (default 1). */
  transmission?: number;
  /**
   * Per-step molecularity (default 1), keyed by the id of the step's TS point, or of the
   * step's end minimum when the step has no TS.
   */
  molecularity?: Readonly<Record<string, StepMolecularity>>;
  /** Unit energies are quoted in inside findings (default kJ/mol): the document's display unit. */
  unit?: EnergyUnit;
}
