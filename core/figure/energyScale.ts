import { scaleLinear } from 'd3';

/** A y scale from energy (display unit) to mm, with its ticks. */
export interface EnergyScale {
  y(value: number): number;
  ticks: number[];
  format(value: number): string;
  /** The rounded domain, low and high. */
  domain: [number, number];
}

/**
 * Linear scale over the known energies, extended to round numbers and ticked by d3
 * (`scaleLinear().nice().ticks()`); `top`/`bottom` are the mm positions of the domain's
 * high and low ends. An empty or flat set of values gets a unit-wide domain. The domain
 * is rounded for `tickCount` ticks; fewer ticks are then drawn while neighbouring ticks
 * would lie closer than `minSpacingMm`, so tick numbers never touch on a short axis, but
 * never down to a single tick.
 */
export function energyScale(values: readonly number[], bottom: number, top: number, tickCount = 5, minSpacingMm = 0): EnergyScale {
  let lo = Math.min(...values);
  let hi = Math.max(...values);
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) [lo, hi] = [0, 1];
  if (hi - lo < 1e-9) [lo, hi] = [lo - 0.5, hi + 0.5];
  const s = scaleLinear().domain([lo, hi]).range([bottom, top]).nice(tickCount);
  const [d0, d1] = s.domain() as [number, number];
  let count = tickCount;
  let ticks = s.ticks(count);
  while (count > 1 && ticks.length > 1 && Math.abs(s(ticks[1]!) - s(ticks[0]!)) < minSpacingMm) {
    // Never thin to a lone tick (a bare "0" says nothing about the scale): keep two at least.
    const fewer = s.ticks(count - 1);
    if (fewer.length < 2) break;
    ticks = fewer;
    count--;
  }
  const format = s.tickFormat(count);
  return { y: (v) => s(v), ticks, format: (v) => format(v), domain: [d0, d1] };
}
