import type { Finding } from '../../profile/types.ts';
import type { NetworkError } from './networkFromReactions.ts';
import type { SolverStats } from './solverTypes.ts';

/** Settings of `simulate`; only the end time is required. */
export interface SimulateOptions {
  /** End time, s. */
  until: number;
  /** Reported times after t = 0 (default 200). */
  points?: number;
  /** Space reported times evenly in log t (default true). */
  logTime?: boolean;
  /** First reported time after 0 on a log grid (default: a hundredth of the fastest time scale). */
  from?: number;
  /** Relative tolerance of the integrator (default 1e-8). */
  rtol?: number;
  /** Absolute tolerance, mol/L (default 1e-14 × the total initial concentration). */
  atol?: number;
  /** Species whose consumption is reported as conversion (default: first species present at t = 0). */
  reference?: string;
  /** Last fraction of the run over which the turnover slope is read (default 0.2). */
  tofWindow?: number;
  maxSteps?: number;
  /** Called as the run advances, with how many of the solver's output times are done. */
  onProgress?: (done: number, total: number) => void;
}

/** Concentrations vs time; concentrations[k][i] is species i at times[k], mol/L. */
export interface Simulation {
  times: number[];
  species: string[];
  labels: string[];
  concentrations: number[][];
  /** Fraction of the reference species consumed, 1 − c(t)/c(0). */
  conversion: number[];
  reference: string;
  /** Cumulative turnovers per catalyst at each time (cycles only). */
  turnovers?: number[];
  /** Long-time slope of turnovers per catalyst, s⁻¹ (cycles that reached steady state). */
  steadyStateTof?: number;
  findings: Finding[];
  stats: SolverStats;
}

/** A simulation, or the input problems (with paths) or solver failure that stopped it. */
export type SimulationOutcome = { ok: true; simulation: Simulation } | { ok: false; errors: NetworkError[] };
