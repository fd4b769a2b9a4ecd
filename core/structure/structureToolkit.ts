import type { Molecule } from '../model/schema.ts';
import type { Composition } from '../thermo/composition.ts';

/** One atom of a 2D depiction; coordinates in bond lengths, y growing downwards. */
export interface DepictionAtom {
  x: number;
  y: number;
  /** Element symbol ("C", "Pd"). */
  element: string;
  /** Hydrogens drawn with the atom's label (implicit and hidden explicit ones). */
  hydrogens: number;
  charge: number;
  /** Atom map number (0 when none), as written in the structure. */
  mapNo: number;
}

/** One bond of a 2D depiction. */
export interface DepictionBond {
  from: number;
  to: number;
  /** 0 for a metal–ligand (dative) bond, else 1–3. */
  order: 0 | 1 | 2 | 3;
  /** Wedge (towards the viewer) or hash (away), narrow end at `from`. */
  stereo: 'none' | 'wedge' | 'hash';
  /** A forming or breaking bond of a transition state: drawn dashed. */
  partial: boolean;
}

/** A molecule laid out flat: atoms and bonds, average bond length 1. */
export interface Depiction {
  atoms: DepictionAtom[];
  bonds: DepictionBond[];
}

/** What the toolkit reads from one structure. */
export interface StructureFacts {
  /** Element counts (hydrogens included) and net charge. */
  composition: Composition;
  /** Hill formula without charge, e.g. "C2H3O2". */
  formula: string;
  /** Atoms other than hydrogen. */
  heavyAtoms: number;
  depiction: Depiction;
}

/** Result of reading a structure: its facts, or a message naming what is wrong. */
export type StructureResult = { ok: true; value: StructureFacts } | { ok: false; message: string };

/**
 * The one interface core uses to reach the cheminformatics toolkit: synchronous once
 * loaded (see loadStructureToolkit), so everything downstream stays synchronous.
 */
export interface StructureToolkit {
  /** Toolkit name and version, for provenance ("openchemlib 9.25.0"). */
  readonly name: string;
  read(molecule: Molecule): StructureResult;
}
