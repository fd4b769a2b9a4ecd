import { describe, expect, it } from 'vitest';
import { integrate, type JacobianFunction, type RhsFunction } from '../../../../core/kinetics/microkinetics/index.ts';
import { scipyFixture, worstMismatch } from './scipyFixture.ts';

// H. H. Robertson (1966), "The solution of a set of reaction rate equations", the stiff test
// problem of Hairer & Wanner, Solving ODEs II, Sec. IV.1 (from memory), written out by hand
// here so the solver is checked apart from the network code.
const robertsonRhs: RhsFunction = (y, d) => {
  d[0] = -0.04 * y[0]! + 1e4 * y[1]! * y[2]!;
  d[2] = 3e7 * y[1]! * y[1]!;
  d[1] = -d[0]! - d[2]!;
};
const robertsonJacobian: JacobianFunction = (y, j) => {
  j[0] = -0.04; j[1] = 1e4 * y[2]!; j[2] = 1e4 * y[1]!;
  j[3] = 0.04; j[4] = -1e4 * y[2]! - 6e7 * y[1]!; j[5] = -1e4 * y[1]!;
  j[7] = 6e7 * y[1]!;
};
const robertson = scipyFixture.problems.robertson!;

describe('integrate', () => {
  it('records the SciPy version and method of its reference fixture', () => {
    expect(scipyFixture.scipy).toBe('1.17.1');
    expect(scipyFixture.method).toMatch(/Radau/);
  });

  // Reference: SciPy 1.17.1 solve_ivp Radau, rtol 1e-10 (tests/fixtures/scipy/microkinetics.json).
  // Tolerance 1e-4 relative with an absolute floor of 1e-14 (y2 peaks at 3.6e-5 and falls to 2e-13).
  it('solves Robertson’s problem to 4e10 s like SciPy Radau', () => {
    const run = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 4e10, {
      rtol: 1e-8, atol: [1e-14, 1e-20, 1e-14], outputTimes: robertson.times, nonNegative: true,
    });
    expect(run.ok).toBe(true);
    expect(run.times).toEqual(robertson.times);
    expect(worstMismatch(run.states, robertson.states, 1e-4, 1e-14)).toBeLessThanOrEqual(1);
    expect(run.stats.jacobianEvaluations).toBe(run.stats.steps);
  });

  // Hairer & Wanner II, Sec. IV.1 tabulate y at t = 40 (from memory): 0.7158271, 9.185535e-6, 0.2841637.
  it('matches the classical Robertson values at t = 40', () => {
    const run = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 40, { rtol: 1e-9, atol: [1e-14, 1e-20, 1e-14], outputTimes: [40] });
    const y = run.states[0]!;
    expect(y[0]).toBeCloseTo(0.7158271, 6);
    expect(y[1]! / 9.185535e-6).toBeCloseTo(1, 6);
    expect(y[2]).toBeCloseTo(0.2841637, 6);
  });

  it('needs fewer steps at a looser tolerance, with error roughly in proportion', () => {
    const opts = (rtol: number) => ({ rtol, atol: [1e-6 * rtol, 1e-12 * rtol, 1e-6 * rtol], outputTimes: [40] });
    const loose = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 40, opts(1e-4));
    const tight = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 40, opts(1e-8));
    expect(loose.stats.steps).toBeLessThan(tight.stats.steps / 4);
    const ref = robertson.states[robertson.times.indexOf(40)]!;
    const rel = (y: Float64Array): number => Math.abs(y[0]! - ref[0]!) / ref[0]!;
    expect(rel(loose.states[0]!)).toBeLessThan(1e-3);
    expect(rel(tight.states[0]!)).toBeLessThan(1e-6);
  });

  it('reports every accepted step when no output times are given', () => {
    const run = integrate((y, d) => { d[0] = -y[0]!; }, (_y, j) => { j[0] = -1; }, [1], 0, 5, { rtol: 1e-8 });
    expect(run.times[0]).toBe(0);
    expect(run.times.at(-1)).toBe(5);
    expect(run.times.length).toBe(run.stats.steps + 1);
    expect(run.states.at(-1)![0]! / Math.exp(-5)).toBeCloseTo(1, 6); // exact e^(−t)
  });

  it('says how many output times are done as it reaches them, ending at all of them', () => {
    const outputTimes = [0, 0.5, 1, 2, 4, 5];
    const calls: [number, number][] = [];
    const run = integrate((y, d) => { d[0] = -y[0]!; }, (_y, j) => { j[0] = -1; }, [1], 0, 5, { rtol: 1e-8, outputTimes, onOutput: (done, total) => calls.push([done, total]) });
    expect(run.ok).toBe(true);
    expect(calls.length).toBeGreaterThan(1);
    for (let k = 1; k < calls.length; k++) expect(calls[k]![0]).toBeGreaterThan(calls[k - 1]![0]);
    expect(calls.at(-1)).toEqual([6, 6]);
  });

  it('keeps concentrations non-negative when asked', () => {
    const run = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 4e10, { rtol: 1e-3, atol: 1e-3, nonNegative: true });
    expect(run.ok).toBe(true);
    for (const y of run.states) for (const v of y) expect(v).toBeGreaterThanOrEqual(0);
  });
});

describe('integrate failures come back as values', () => {
  const decay: RhsFunction = (y, d) => { d[0] = -y[0]!; };
  const decayJ: JacobianFunction = (_y, j) => { j[0] = -1; };

  it('stops at the step budget', () => {
    const run = integrate(robertsonRhs, robertsonJacobian, [1, 0, 0], 0, 4e10, { maxSteps: 20 });
    expect(run.ok).toBe(false);
    if (!run.ok) { expect(run.error.code).toBe('max-steps'); expect(run.error.t).toBeGreaterThan(0); }
  });

  // y′ = e^y from y(0) = 0 blows up at t = 1 (exact y = −ln(1 − t)); the solver must not step past it.
  // (y′ = y² is no test here: a linearly implicit step maps it exactly across the pole.)
  it('reports step-size collapse at a finite-time blow-up', () => {
    const run = integrate((y, d) => { d[0] = Math.exp(y[0]!); }, (y, j) => { j[0] = Math.exp(y[0]!); }, [0], 0, 2, { rtol: 1e-6 });
    expect(run.ok).toBe(false);
    if (!run.ok) {
      expect(['step-underflow', 'non-finite']).toContain(run.error.code);
      expect(run.error.t).toBeLessThan(1);
      expect(run.error.t).toBeGreaterThan(0.99);
    }
  });

  it.each([
    [{ rtol: 0 }, /rtol/],
    [{ atol: [1, 2] }, /atol has 2 entries/],
    [{ outputTimes: [3, 2] }, /must increase/],
    [{ outputTimes: [20] }, /outside/],
  ] as const)('rejects bad options %o', (options, message) => {
    const run = integrate(decay, decayJ, [1], 0, 10, options);
    expect(run.ok).toBe(false);
    if (!run.ok) { expect(run.error.code).toBe('invalid-input'); expect(run.error.message).toMatch(message); }
  });

  it('rejects an end time before the start', () => {
    const run = integrate(decay, decayJ, [1], 5, 1);
    expect(!run.ok && run.error.message).toMatch(/end time/);
  });
});
