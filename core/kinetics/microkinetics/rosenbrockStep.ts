import { luDecompose, luSolve } from './luDecompose.ts';
import type { RosenbrockTableau } from './rodas3.ts';
import type { RhsFunction } from './solverTypes.ts';

/** Scratch arrays of one problem size, reused from step to step. */
export interface StepWorkspace {
  n: number;
  matrix: Float64Array;
  pivots: Int32Array;
  stages: Float64Array[];
  yStage: Float64Array;
  fStage: Float64Array;
}

/** Allocates a workspace for systems of size n and the given method. */
export function makeWorkspace(n: number, tableau: RosenbrockTableau): StepWorkspace {
  return {
    n,
    matrix: new Float64Array(n * n),
    pivots: new Int32Array(n),
    stages: Array.from({ length: tableau.stages }, () => new Float64Array(n)),
    yStage: new Float64Array(n),
    fStage: new Float64Array(n),
  };
}

/** Outcome of one step: done, a singular iteration matrix, or non-finite values. */
export type StepStatus = 'ok' | 'singular' | 'non-finite';

/**
 * One step of a Rosenbrock method in the transformed form of Hairer & Wanner
 * (Solving ODEs II, Sec. IV.7): factors I/(hγ) − J once, then solves one linear system per
 * stage. Writes the new state into `yNew` and the embedded error estimate into `err`.
 * `jacobian` is J at y (row-major); `f0` is f(y). Counts right-hand-side calls in `calls`.
 */
export function rosenbrockStep(
  tableau: RosenbrockTableau, rhs: RhsFunction, y: Float64Array, f0: Float64Array,
  jacobian: Float64Array, h: number, ws: StepWorkspace, yNew: Float64Array, err: Float64Array,
  calls: { rhs: number },
): StepStatus {
  const { n, matrix, pivots, stages, yStage, fStage } = ws;
  const diagonal = 1 / (h * tableau.gamma);
  for (let i = 0; i < n * n; i++) matrix[i] = -jacobian[i]!;
  for (let i = 0; i < n; i++) matrix[i * n + i]! += diagonal;
  if (!luDecompose(matrix, n, pivots)) return 'singular';
  for (let s = 0; s < tableau.stages; s++) {
    const a = tableau.a[s]!;
    const c = tableau.c[s]!;
    const k = stages[s]!;
    if (a.every((v) => v === 0)) {
      k.set(f0);
    } else {
      yStage.set(y);
      for (let j = 0; j < s; j++) {
        const coef = a[j]!;
        if (coef === 0) continue;
        const kj = stages[j]!;
        for (let i = 0; i < n; i++) yStage[i]! += coef * kj[i]!;
      }
      rhs(yStage, fStage);
      calls.rhs++;
      k.set(fStage);
    }
    for (let j = 0; j < s; j++) {
      const coef = c[j]! / h;
      if (coef === 0) continue;
      const kj = stages[j]!;
      for (let i = 0; i < n; i++) k[i]! += coef * kj[i]!;
    }
    luSolve(matrix, n, pivots, k);
  }
  yNew.set(y);
  err.fill(0);
  for (let s = 0; s < tableau.stages; s++) {
    const k = stages[s]!;
    const m = tableau.m[s]!;
    const e = tableau.e[s]!;
    for (let i = 0; i < n; i++) {
      yNew[i]! += m * k[i]!;
      err[i]! += e * k[i]!;
    }
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(yNew[i]!) || !Number.isFinite(err[i]!)) return 'non-finite';
  return 'ok';
}
