/**
 * Scaled root-mean-square norm of a local error estimate, sc_i = atol_i + rtol·max(|y_i|, |ŷ_i|)
 * (Hairer, Nørsett & Wanner, Solving ODEs I, 2nd ed. 1993, Sec. II.4, eq. (4.11)).
 * A step is acceptable when the norm is ≤ 1.
 */
export function errorNorm(
  err: Float64Array, y: Float64Array, yNew: Float64Array, rtol: number, atol: Float64Array,
): number {
  const n = err.length;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const scale = atol[i]! + rtol * Math.max(Math.abs(y[i]!), Math.abs(yNew[i]!));
    const r = err[i]! / scale;
    sum += r * r;
  }
  return Math.sqrt(sum / Math.max(n, 1));
}
