/** Median and 95 % interval (2.5th and 97.5th percentiles) of one sampled number. */
export interface Interval {
  median: number;
  low: number;
  high: number;
  /** Sample standard deviation (n − 1). */
  sd: number;
  /** Samples in which the number could be computed. */
  samples: number;
}

/**
 * Puts the k-th smallest value of `xs[left..right]` at index k, smaller ones before it, larger
 * after (Hoare's FIND, Commun. ACM 4, 321 (1961), from memory). Written for Float64Array
 * because d3's quickselect calls a comparator per step and was no faster than a full sort here.
 */
function selectInPlace(xs: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    const pivot = xs[(left + right) >> 1]!;
    let i = left, j = right;
    while (i <= j) {
      while (xs[i]! < pivot) i++;
      while (xs[j]! > pivot) j--;
      if (i <= j) { const t = xs[i]!; xs[i] = xs[j]!; xs[j] = t; i++; j--; }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}

/**
 * The p-quantile of `xs` by linear interpolation between order statistics (Hyndman & Fan
 * type 7, the rule of d3's quantile), in O(N); `xs` is reordered. `to` is the index of an
 * order statistic already in place (nothing after it is smaller), so quantiles asked from the
 * highest down each search only what lies below the last, and the next order statistic is the
 * smallest value up to `to`.
 */
function quantileInPlace(xs: Float64Array, p: number, to = xs.length - 1): { value: number; at: number } {
  const h = (xs.length - 1) * p;
  const i0 = Math.floor(h);
  const right = Math.max(to, i0);
  selectInPlace(xs, i0, 0, right);
  let next = xs[i0]!;
  if (i0 + 1 < xs.length) {
    next = Infinity;
    const end = i0 + 1 <= right ? right : xs.length - 1;
    for (let i = i0 + 1; i <= end; i++) if (xs[i]! < next) next = xs[i]!;
  }
  return { value: xs[i0]! + (next - xs[i0]!) * (h - i0), at: i0 };
}

/**
 * Median and 2.5–97.5 % percentiles of the finite values, or null when none is finite.
 * `scratch` (at least as long as `values`) is used for the reordering when given, so a caller
 * summarising many numbers allocates once.
 */
export function summarise(values: Float64Array, scratch?: Float64Array): Interval | null {
  const kept = scratch && scratch.length >= values.length ? scratch : new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) kept[n++] = values[i]!;
  if (n === 0) return null;
  const xs = kept.subarray(0, n);
  let mean = 0;
  for (let i = 0; i < n; i++) mean += xs[i]!;
  mean /= n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (xs[i]! - mean) ** 2;
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  const high = quantileInPlace(xs, 0.975);
  const median = quantileInPlace(xs, 0.5, high.at);
  const low = quantileInPlace(xs, 0.025, median.at);
  return { median: median.value, low: low.value, high: high.value, sd, samples: n };
}

/** Share of the samples in which each outcome occurred (null outcomes are not counted). */
export function frequencies(outcomes: readonly (string | null)[]): Record<string, number> {
  const counts: Record<string, number> = {};
  let n = 0;
  for (const o of outcomes) if (o !== null) { counts[o] = (counts[o] ?? 0) + 1; n++; }
  for (const k of Object.keys(counts)) counts[k] = counts[k]! / n;
  return counts;
}
