import { describe, expect, it } from 'vitest';
import { inverse, Matrix } from 'ml-matrix';
import { RODAS3 } from '../../../../core/kinetics/microkinetics/index.ts';
import { makeWorkspace, rosenbrockStep } from '../../../../core/kinetics/microkinetics/rosenbrockStep.ts';

const s = RODAS3.stages;
const lower = (rows: readonly (readonly number[])[]): Matrix =>
  new Matrix(Array.from({ length: s }, (_, i) => Array.from({ length: s }, (_, j) => (j < i ? rows[i]![j]! : 0))));

// Back from the transformed coefficients to the standard ones (Hairer & Wanner II,
// Sec. IV.7): Γ = (diag(1/γ) − C)^−1, α = AΓ, b = mΓ.
const gammaMatrix = inverse(Matrix.eye(s).mul(1 / RODAS3.gamma).sub(lower(RODAS3.c)));
const alpha = lower(RODAS3.a).mmul(gammaMatrix);
const weights = (v: readonly number[]): number[] => new Matrix([[...v]]).mmul(gammaMatrix).to1DArray();
const beta = alpha.clone().add(gammaMatrix);
const betaPrime = (i: number): number => beta.getRow(i).slice(0, i).reduce((a, v) => a + v, 0);
const alphaSum = (i: number): number => alpha.getRow(i).reduce((a, v) => a + v, 0);

function conditions(b: number[]): number[] {
  const g = RODAS3.gamma;
  const sum = (f: (i: number) => number): number => b.reduce((acc, bi, i) => acc + bi * f(i), 0);
  return [
    sum(() => 1) - 1,
    sum(betaPrime) - (0.5 - g),
    sum((i) => alphaSum(i) ** 2) - 1 / 3,
    sum((i) => beta.getRow(i).slice(0, i).reduce((a, bij, j) => a + bij * betaPrime(j), 0)) - (1 / 6 - g + g * g),
  ];
}

/** One step of y′ = λy with step h: the stability function R(hλ) (real or complex via 2×2 form). */
function stabilityFunction(re: number, im: number): number {
  const jac = Float64Array.from([re, -im, im, re]);
  const rhs = (y: Float64Array, d: Float64Array): void => { d[0] = re * y[0]! - im * y[1]!; d[1] = im * y[0]! + re * y[1]!; };
  const y = Float64Array.from([1, 0]);
  const f = new Float64Array(2);
  rhs(y, f);
  const yNew = new Float64Array(2);
  rosenbrockStep(RODAS3, rhs, y, f, jac, 1, makeWorkspace(2, RODAS3), yNew, new Float64Array(2), { rhs: 0 });
  return Math.hypot(yNew[0]!, yNew[1]!);
}

describe('RODAS3 coefficients', () => {
  // Order conditions for Rosenbrock methods up to order 3: Hairer & Wanner, Solving ODEs II, Table IV.7.1.
  it('satisfy the order conditions up to order 3', () => {
    for (const c of conditions(weights(RODAS3.m))) expect(Math.abs(c)).toBeLessThan(1e-14);
  });

  it('embed a solution of order 2 but not 3 (so the error estimate is meaningful)', () => {
    const embedded = weights(RODAS3.m.map((m, i) => m - RODAS3.e[i]!));
    const c = conditions(embedded);
    expect(Math.abs(c[0]!) + Math.abs(c[1]!)).toBeLessThan(1e-14);
    expect(Math.abs(c[2]!) + Math.abs(c[3]!)).toBeGreaterThan(1e-3);
  });

  // L-stability: |R(z)| ≤ 1 on the left half-plane and R(∞) = 0 (Hairer & Wanner II, Sec. IV.3).
  it('is L-stable: R(z) → 0 as z → −∞ and |R| ≤ 1 on the imaginary axis and left half-plane', () => {
    expect(stabilityFunction(-1e12, 0)).toBeLessThan(1e-10);
    for (const y of [0.1, 1, 3, 10, 100, 1e4]) expect(stabilityFunction(0, y)).toBeLessThanOrEqual(1 + 1e-12);
    for (const x of [-0.5, -2, -20]) for (const y of [0, 1, 5, 50]) expect(stabilityFunction(x, y)).toBeLessThan(1);
  });

  // y′ = −y² is integrated exactly by this method (a Riccati equation), so a cubic term is used.
  it('converges with order 3 on y′ = −y³, exact y = 1/√(1 + 2t) (fixed steps)', () => {
    const rhs = (y: Float64Array, d: Float64Array): void => { d[0] = -(y[0]! ** 3); };
    const globalError = (steps: number): number => {
      const h = 1 / steps;
      const ws = makeWorkspace(1, RODAS3);
      let y = Float64Array.from([1]);
      let yNew = new Float64Array(1);
      const f = new Float64Array(1);
      for (let k = 0; k < steps; k++) {
        rhs(y, f);
        rosenbrockStep(RODAS3, rhs, y, f, Float64Array.from([-3 * y[0]! ** 2]), h, ws, yNew, new Float64Array(1), { rhs: 0 });
        [y, yNew] = [yNew, y];
      }
      return Math.abs(y[0]! - 1 / Math.sqrt(3));
    };
    const observed = Math.log2(globalError(40) / globalError(80));
    expect(observed).toBeGreaterThan(2.8);
    expect(observed).toBeLessThan(3.3);
  });
});
