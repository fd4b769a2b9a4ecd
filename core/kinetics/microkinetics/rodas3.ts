/**
 * Coefficients of RODAS3, a four-stage Rosenbrock method of order 3 with an embedded
 * order-2 solution; both are stiffly accurate, so the stability function vanishes at
 * infinity (L-stable) — the property that lets steps grow far beyond the fastest time
 * scale of a stiff network.
 *
 * Source: A. Sandu, J. G. Verwer, J. G. Blom, E. J. Spee, G. R. Carmichael, F. A. Potra,
 * "Benchmarking stiff ODE solvers for atmospheric chemistry problems II: Rosenbrock
 * solvers", Atmos. Environ. 31, 3459–3472 (1997); the method family and the transformed
 * form used here are from E. Hairer, G. Wanner, Solving Ordinary Differential Equations II,
 * 2nd ed., Springer 1996, Sec. IV.7 (coefficients from memory; the order conditions and
 * R(∞) = 0 are re-checked in tests/unit/kinetics/microkinetics/rodas3.test.ts).
 *
 * Transformed form (no Jacobian–vector products), for an autonomous system y′ = f(y):
 *   (I/(hγ) − J) k_i = f(y + Σ_{j<i} a_ij k_j) + Σ_{j<i} (c_ij/h) k_j
 *   y₁ = y + Σ m_i k_i,   error estimate = Σ e_i k_i
 */
export interface RosenbrockTableau {
  stages: number;
  gamma: number;
  /** Strictly lower-triangular rows: a[i][j] for j < i. */
  a: readonly (readonly number[])[];
  c: readonly (readonly number[])[];
  m: readonly number[];
  e: readonly number[];
  /** Order of the lower (embedded) solution: the error estimate is O(h^(order+1)). */
  embeddedOrder: number;
}

/** RODAS3 (Sandu et al. 1997), see the file comment. */
export const RODAS3: RosenbrockTableau = {
  stages: 4,
  gamma: 0.5,
  a: [[], [0], [2, 0], [2, 0, 1]],
  c: [[], [4], [1, -1], [1, -1, -8 / 3]],
  m: [2, 0, 1, 1],
  e: [0, 0, 0, 1],
  embeddedOrder: 2,
};
