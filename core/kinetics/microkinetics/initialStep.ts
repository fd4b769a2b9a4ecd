/**
 * First trial step h₀ = 0.01·‖y₀‖/‖f(y₀)‖ in the scaled norm, the starting guess of
 * Hairer, Nørsett & Wanner, Solving ODEs I, Sec. II.4 (first part of their algorithm);
 * the error control corrects a poor guess within a few rejected steps.
 */
export function initialStep(y0: Float64Array, f0: Float64Array, rtol: number, atol: Float64Array, span: number): number {
  let d0 = 0;
  let d1 = 0;
  for (let i = 0; i < y0.length; i++) {
    const scale = atol[i]! + rtol * Math.abs(y0[i]!);
    d0 += (y0[i]! / scale) ** 2;
    d1 += (f0[i]! / scale) ** 2;
  }
  d0 = Math.sqrt(d0 / Math.max(y0.length, 1));
  d1 = Math.sqrt(d1 / Math.max(y0.length, 1));
  const guess = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 * span : (0.01 * d0) / d1;
  return Math.min(guess, span);
}
