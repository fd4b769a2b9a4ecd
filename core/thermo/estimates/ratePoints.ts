/** A measured rate constant at one temperature (k in s⁻¹ for first order). */
export interface RatePoint {
  temperatureK: number;
  k: number;
}

/** Null when every point has T > 0 and k > 0, else a message naming the first bad point (1-based). */
export function checkRatePoints(points: readonly RatePoint[]): string | null {
  for (const [i, p] of points.entries()) {
    if (!(p.temperatureK > 0) || !Number.isFinite(p.temperatureK)) return `point ${i + 1}: temperature must be positive, got ${p.temperatureK}`;
    if (!(p.k > 0) || !Number.isFinite(p.k)) return `point ${i + 1}: rate constant must be positive, got ${p.k}`;
  }
  return null;
}
