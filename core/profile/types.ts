import type { PointKind, Quantity, Unit } from '../model/schema.ts';
import type { ResolvedReference } from './referenceFrame.ts';

/** Where a resolved energy came from. */
export type Route = 'typed' | 'species' | 'formation' | 'step' | 'barrier' | 'estimate' | 'missing';

export interface Provenance {
  route: Route;
  /** One sentence a chemist can read, e.g. "sum of 3 species (E + G correction), 1 M". */
  detail: string;
  /** Approximations made on the way (temperature rescaling, estimate validity, ...). */
  approximations: string[];
}

/** A point with its energy relative to the reference, in J/mol (null when it cannot be had). */
export interface ResolvedPoint {
  id: string;
  label: string;
  kind: PointKind;
  energyJ: number | null;
  provenance: Provenance;
}

export interface ResolvedPathway {
  id: string;
  name: string;
  cycle: boolean;
  /**
   * Pathways with equal keys share one zero; energies of pathways with different keys are not
   * comparable. Absent on hand-built pathways, which are taken to share one zero.
   */
  scaleKey?: string;
  points: ResolvedPoint[];
}

export type Severity = 'error' | 'warning' | 'info';

/** A consistency finding, located by pathway and point ids where it applies. */
export interface Finding {
  severity: Severity;
  /** Stable, machine-readable code, e.g. "ts-below-neighbour". */
  code: string;
  message: string;
  pathway?: string;
  point?: string;
}

/** The whole document in one quantity, temperature, standard state; energies in J/mol. */
export interface ResolvedProfile {
  quantity: Quantity;
  /** Display unit chosen for output (energies here stay in J/mol). */
  unit: Unit;
  temperatureK: number;
  /** What every energy is measured from (absent on hand-built profiles). */
  reference?: ResolvedReference;
  pathways: ResolvedPathway[];
  findings: Finding[];
}
