/**
 * In-place LU factorisation with partial (row) pivoting of a dense n×n matrix stored
 * row-major: PA = LU, L unit lower (below the diagonal), U on and above it.
 * Doolittle elimination with the largest-magnitude pivot in each column
 * (Golub & Van Loan, Matrix Computations, 4th ed. 2013, Alg. 3.4.1).
 * Returns false when a pivot is zero or not finite (singular or overflowed matrix).
 */
export function luDecompose(a: Float64Array, n: number, pivots: Int32Array): boolean {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k]!);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]!);
      if (v > best) { best = v; p = i; }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    pivots[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = t;
      }
    }
    const pivot = a[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const factor = a[i * n + k]! / pivot;
      if (factor === 0) continue;
      a[i * n + k] = factor;
      for (let j = k + 1; j < n; j++) a[i * n + j]! -= factor * a[k * n + j]!;
    }
  }
  return true;
}

/** Solves A x = b in place in `b`, given the factors and pivots from {@link luDecompose}. */
export function luSolve(lu: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) { const t = b[k]!; b[k] = b[p]!; b[p] = t; }
  }
  for (let i = 1; i < n; i++) {
    let s = b[i]!;
    for (let j = 0; j < i; j++) s -= lu[i * n + j]! * b[j]!;
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j]! * b[j]!;
    b[i] = s / lu[i * n + i]!;
  }
}
