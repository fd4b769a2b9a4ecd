import { GAS_CONSTANT } from '../../units/constants.ts';
import { linearFit } from './linearFit.ts';
import { checkRatePoints, type RatePoint } from './ratePoints.ts';

/** Arrhenius parameters: E_a in J/mol, ln A with A in the units of k. */
export interface ArrheniusFit {
  eaJ: number;
  lnA: number;
  /** Standard errors (least squares with ≥ 3 points), else null. */
  eaSE: number | null;
  lnASE: number | null;
}

/** Result of the Arrhenius fits. */
export type ArrheniusResult = { ok: true; value: ArrheniusFit } | { ok: false; message: string };

/**
 * Two-point Arrhenius activation energy E_a = R ln(k2/k1)/(1/T1 − 1/T2) and ln A
 * (IUPAC Gold Book 'activation energy', E_a = −R d ln k / d(1/T)).
 */
export function arrheniusTwoPoint(a: RatePoint, b: RatePoint): ArrheniusResult {
  const bad = checkRatePoints([a, b]);
  if (bad !== null) return { ok: false, message: bad };
  if (a.temperatureK === b.temperatureK) return { ok: false, message: 'the two temperatures are equal' };
  const eaJ = (GAS_CONSTANT * Math.log(b.k / a.k)) / (1 / a.temperatureK - 1 / b.temperatureK);
  return { ok: true, value: { eaJ, lnA: Math.log(a.k) + eaJ / (GAS_CONSTANT * a.temperatureK), eaSE: null, lnASE: null } };
}

/** Least-squares Arrhenius fit of ln k on 1/T: E_a = −R·slope, ln A = intercept (with standard errors). */
export function arrheniusFit(points: readonly RatePoint[]): ArrheniusResult {
  const bad = checkRatePoints(points);
  if (bad !== null) return { ok: false, message: bad };
  const fit = linearFit(points.map((p) => 1 / p.temperatureK), points.map((p) => Math.log(p.k)));
  if (!fit.ok) return { ok: false, message: `Arrhenius plot: ${fit.message.replace('x values', 'temperatures')}` };
  const { slope, intercept, slopeSE, interceptSE } = fit.value;
  return { ok: true, value: { eaJ: -GAS_CONSTANT * slope, lnA: intercept, eaSE: slopeSE === null ? null : GAS_CONSTANT * slopeSE, lnASE: interceptSE } };
}
