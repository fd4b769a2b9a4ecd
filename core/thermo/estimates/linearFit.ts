/** Ordinary least-squares straight line y = slope·x + intercept. */
export interface LinearFit {
  slope: number;
  intercept: number;
  /** Standard errors from the residual variance s² = SSR/(n − 2); null with fewer than 3 points. */
  slopeSE: number | null;
  interceptSE: number | null;
  n: number;
  /** Residual sum of squares. */
  ssr: number;
}

/** Result of {@link linearFit}. */
export type LinearFitResult = { ok: true; value: LinearFit } | { ok: false; message: string };

/**
 * Ordinary least squares with standard errors SE(b) = s/√Sxx, SE(a) = s√(1/n + x̄²/Sxx)
 * (e.g. Draper & Smith, Applied Regression Analysis, 3rd ed. (1998), ch. 1, from memory).
 * Sums are taken about the means, which keeps 1/T data (spread ~1e-4) accurate.
 */
export function linearFit(x: readonly number[], y: readonly number[]): LinearFitResult {
  if (x.length !== y.length) throw new RangeError('x and y must have the same length');
  const n = x.length;
  if (n < 2) return { ok: false, message: `a straight-line fit needs at least 2 points, got ${n}` };
  const mean = (v: readonly number[]): number => v.reduce((s, t) => s + t, 0) / n;
  const xm = mean(x);
  const ym = mean(y);
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] ?? 0) - xm;
    sxx += dx * dx;
    sxy += dx * ((y[i] ?? 0) - ym);
  }
  if (!(sxx > 0)) return { ok: false, message: 'all x values are equal: the slope is undefined' };
  const slope = sxy / sxx;
  const intercept = ym - slope * xm;
  let ssr = 0;
  for (let i = 0; i < n; i++) ssr += ((y[i] ?? 0) - (intercept + slope * (x[i] ?? 0))) ** 2;
  const s = n > 2 ? Math.sqrt(ssr / (n - 2)) : null;
  return {
    ok: true,
    value: { slope, intercept, n, ssr, slopeSE: s === null ? null : s / Math.sqrt(sxx), interceptSE: s === null ? null : s * Math.sqrt(1 / n + (xm * xm) / sxx) },
  };
}
