import { halfLifeFirstOrder, logEyringRate } from './eyring.ts';

/** Plain-language band of a first-order half-life. */
export type FeasibilityBand = 'sub-second' | 'seconds to minutes' | 'minutes to hours' | 'hours to days' | 'needs heating or days';

/** What a barrier implies at a temperature, read by the trade's rule of thumb. */
export interface FeasibilityReading {
  /** First-order half-life ln 2/k with κ = 1, in s. */
  halfLifeSeconds: number;
  band: FeasibilityBand;
  /** States that this is a rule of thumb, not a measurement. */
  basis: string;
}

const MINUTE = 60;
const HOUR = 3600;
const WEEK = 7 * 24 * HOUR;

/**
 * Common practice, not a published rule: reads a free-energy barrier (J/mol) as the
 * first-order half-life it implies (Eyring, κ = 1) and a plain phrase. Band edges are on the
 * half-life: < 1 s, < 1 min, < 8 h, < 1 week, longer; at 298.15 K they fall near 17.7, 20.1,
 * 23.8 and 25.6 kcal/mol, matching the usual "20–23 kcal/mol runs in minutes to hours,
 * ≳ 25 needs heating or days" reading.
 */
export function feasibilityReading(barrierJ: number, temperatureK: number): FeasibilityReading {
  const halfLifeSeconds = halfLifeFirstOrder(Math.exp(logEyringRate(barrierJ, temperatureK)));
  return {
    halfLifeSeconds,
    band: bandOf(halfLifeSeconds),
    basis: 'common practice: first-order half-life at this temperature, κ = 1; a rule of thumb, not a prediction of the observed rate',
  };
}

function bandOf(halfLifeSeconds: number): FeasibilityBand {
  if (halfLifeSeconds < 1) return 'sub-second';
  if (halfLifeSeconds < MINUTE) return 'seconds to minutes';
  if (halfLifeSeconds < 8 * HOUR) return 'minutes to hours';
  if (halfLifeSeconds < WEEK) return 'hours to days';
  return 'needs heating or days';
}
