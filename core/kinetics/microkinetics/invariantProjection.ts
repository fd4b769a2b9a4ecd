import { luDecompose, luSolve } from './luDecompose.ts';

/**
 * Returns a function that moves a state back onto the conservation laws W·y = W·y₀ after a
 * solver step, by the smallest change in the metric D⁻¹ with D = diag(|y| + atol):
 * y ← y − D Wᵀ (W D Wᵀ)⁻¹ (W y − W y₀). Projection onto the invariant manifold is a standard
 * remedy for drift of first integrals (Hairer, Lubich & Wanner, Geometric Numerical
 * Integration, 2nd ed. 2006, Sec. IV.4 [from memory]); the weights keep components near zero
 * nearly untouched, so the step stays non-negative. Only the first `w.length` components of
 * y (the species) are constrained; a trailing tally is left alone.
 */
export function invariantProjection(laws: readonly Float64Array[], y0: ArrayLike<number>, atol: ArrayLike<number>): (y: Float64Array) => void {
  const k = laws.length;
  if (k === 0) return () => {};
  const m = laws[0]!.length;
  const targets = laws.map((w) => dot(w, y0, m));
  const d = new Float64Array(m);
  const gram = new Float64Array(k * k);
  const residual = new Float64Array(k);
  const pivots = new Int32Array(k);
  return (y) => {
    for (let i = 0; i < m; i++) d[i] = Math.abs(y[i]!) + atol[i]!;
    let off = false;
    laws.forEach((w, a) => {
      residual[a] = dot(w, y, m) - targets[a]!;
      if (residual[a] !== 0) off = true;
      for (let b = 0; b < k; b++) {
        let s = 0;
        for (let i = 0; i < m; i++) s += w[i]! * d[i]! * laws[b]![i]!;
        gram[a * k + b] = s;
      }
    });
    if (!off || !luDecompose(gram, k, pivots)) return;
    luSolve(gram, k, pivots, residual);
    for (let i = 0; i < m; i++) {
      let s = 0;
      for (let a = 0; a < k; a++) s += laws[a]![i]! * residual[a]!;
      y[i]! -= d[i]! * s;
    }
  };
}

function dot(w: Float64Array, y: ArrayLike<number>, m: number): number {
  let s = 0;
  for (let i = 0; i < m; i++) s += w[i]! * y[i]!;
  return s;
}
