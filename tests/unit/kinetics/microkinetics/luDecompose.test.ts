import { describe, expect, it } from 'vitest';
import { LuDecomposition, Matrix } from 'ml-matrix';
import { luDecompose, luSolve } from '../../../../core/kinetics/microkinetics/index.ts';

function randomMatrix(n: number, seed: number): number[][] {
  let s = seed;
  const next = (): number => { s = (s * 1103515245 + 12345) % 2147483648; return s / 2147483648 - 0.5; };
  return Array.from({ length: n }, () => Array.from({ length: n }, next));
}

describe('luDecompose / luSolve', () => {
  // Reference library: ml-matrix's LuDecomposition (partial pivoting) solves the same systems.
  it.each([3, 12, 40])('solves a random %i×%i system like ml-matrix', (n) => {
    const a = randomMatrix(n, n);
    const b = Array.from({ length: n }, (_, i) => Math.sin(i + 1));
    const lu = Float64Array.from(a.flat());
    const pivots = new Int32Array(n);
    expect(luDecompose(lu, n, pivots)).toBe(true);
    const x = Float64Array.from(b);
    luSolve(lu, n, pivots, x);
    const expected = new LuDecomposition(new Matrix(a)).solve(Matrix.columnVector(b)).to1DArray();
    for (let i = 0; i < n; i++) expect(x[i]).toBeCloseTo(expected[i]!, 10);
  });

  it('needs pivoting for a zero leading entry (Golub & Van Loan Sec. 3.4)', () => {
    const lu = Float64Array.from([0, 1, 1, 0]);
    const pivots = new Int32Array(2);
    expect(luDecompose(lu, 2, pivots)).toBe(true);
    const x = Float64Array.from([2, 3]);
    luSolve(lu, 2, pivots, x);
    expect(Array.from(x)).toEqual([3, 2]);
  });

  it('reports a singular matrix instead of dividing by zero', () => {
    expect(luDecompose(Float64Array.from([1, 2, 2, 4]), 2, new Int32Array(2))).toBe(false);
  });
});
