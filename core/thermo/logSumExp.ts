/** ln(e^a + e^b) without overflow; −Infinity stands for an empty sum. */
export function logAddExp(a: number, b: number): number {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const hi = a > b ? a : b;
  return hi + Math.log1p(Math.exp(-Math.abs(a - b)));
}

/**
 * ln Σ_i e^{x_i} by shifting every term by the largest, so that no e^{x} over- or underflows;
 * −Infinity for an empty list.
 */
export function logSumExp(xs: readonly number[]): number {
  let hi = -Infinity;
  for (const x of xs) if (x > hi) hi = x;
  if (!Number.isFinite(hi)) return hi;
  let sum = 0;
  for (const x of xs) sum += Math.exp(x - hi);
  return hi + Math.log(sum);
}

/** out[i] = ln Σ_{k<i} e^{x_k}; length n + 1, out[0] = −Infinity (exclusive prefix sums). */
export function prefixLogSumExp(xs: ArrayLike<number>): Float64Array {
  const out = new Float64Array(xs.length + 1);
  out[0] = -Infinity;
  for (let i = 0; i < xs.length; i++) out[i + 1] = logAddExp(out[i]!, xs[i]!);
  return out;
}

/** out[i] = ln Σ_{k≥i} e^{x_k}; length n + 1, out[n] = −Infinity (suffix sums). */
export function suffixLogSumExp(xs: ArrayLike<number>): Float64Array {
  const n = xs.length;
  const out = new Float64Array(n + 1);
  out[n] = -Infinity;
  for (let i = n - 1; i >= 0; i--) out[i] = logAddExp(out[i + 1]!, xs[i]!);
  return out;
}
