import { BOLTZMANN, GAS_CONSTANT, PLANCK } from '../../units/constants.ts';
import { linearFit, type LinearFit } from './linearFit.ts';
import { checkRatePoints, type RatePoint } from './ratePoints.ts';

/** Activation parameters from an Eyring plot, SI units. */
export interface EyringFit {
  /** Δ‡H in J/mol and its standard error (null with fewer than 3 points). */
  dHJ: number;
  dHSE: number | null;
  /** Δ‡S in J/(mol K) and its standard error. */
  dSJK: number;
  dSSE: number | null;
  /** The straight line ln(k (c°)^(m−1)/T) = slope/T + intercept. */
  line: LinearFit;
}

/** Options of {@link eyringFit}. */
export interface EyringFitOptions {
  molecularity?: number;
  transmission?: number;
  /** Standard concentration c° in mol/L (default 1). */
  standardConcentration?: number;
}

/** Result of {@link eyringFit}. */
export type EyringFitResult = { ok: true; value: EyringFit } | { ok: false; message: string };

/**
 * Eyring-plot regression: ln(k (c°)^(m−1)/T) = −(Δ‡H/R)(1/T) + ln(κ k_B/h) + Δ‡S/R by ordinary
 * least squares (Eyring, J. Chem. Phys. 3, 107 (1935); IUPAC Gold Book 'enthalpy of activation').
 * Needs ≥ 2 points; standard errors need ≥ 3.
 */
export function eyringFit(points: readonly RatePoint[], options: EyringFitOptions = {}): EyringFitResult {
  const bad = checkRatePoints(points);
  if (bad !== null) return { ok: false, message: bad };
  const m = options.molecularity ?? 1;
  const c0 = options.standardConcentration ?? 1;
  const kappa = options.transmission ?? 1;
  const fit = linearFit(points.map((p) => 1 / p.temperatureK), points.map((p) => Math.log((p.k * c0 ** (m - 1)) / p.temperatureK)));
  if (!fit.ok) return { ok: false, message: `Eyring plot: ${fit.message.replace('x values', 'temperatures')}` };
  const line = fit.value;
  const lnPrefactor = Math.log((kappa * BOLTZMANN) / PLANCK);
  return {
    ok: true,
    value: {
      dHJ: -GAS_CONSTANT * line.slope,
      dHSE: line.slopeSE === null ? null : GAS_CONSTANT * line.slopeSE,
      dSJK: GAS_CONSTANT * (line.intercept - lnPrefactor),
      dSSE: line.interceptSE === null ? null : GAS_CONSTANT * line.interceptSE,
      line,
    },
  };
}
