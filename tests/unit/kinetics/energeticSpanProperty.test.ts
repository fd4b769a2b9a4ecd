import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSteps, energeticSpan } from '../../../core/kinetics/index.ts';
import { cycle, kcal, rel } from './build.ts';
import { naiveSpan } from './spanReference.ts';
import { cycleSteadyState } from './steadyState.ts';

const T = 298.15;

/** A random cycle: N intermediates in [−25, 25], every TS 0–25 above its higher neighbour, ΔG_r in [−30, dgMax] (kcal/mol). */
const randomCycle = (dgMax: number) => fc
  .integer({ min: 1, max: 9 })
  .chain((n) => fc.tuple(
    fc.array(fc.double({ min: -25, max: 25, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
    fc.array(fc.double({ min: 0, max: 25, noNaN: true }), { minLength: n, maxLength: n }),
    fc.double({ min: -30, max: dgMax, noNaN: true }),
  ))
  .map(([rest, barriers, dg]) => {
    const ints = [0, ...rest];
    const energies: number[] = [];
    ints.forEach((e, i) => energies.push(e, Math.max(e, ints[i + 1] ?? dg) + barriers[i]!));
    energies.push(dg);
    return { energies, ints, tss: energies.filter((_, k) => k % 2 === 1), dg };
  });

describe('energeticSpan against independent references', () => {
  it('equals a naive O(N²) span sum for random cycles, with X_TOF summing to 1', () => {
    // Naive reference written from REFERENCE.md §6 compact form (Kozuch & Shaik ACR 2011).
    fc.assert(fc.property(randomCycle(-0.01), ({ energies, ints, tss, dg }) => {
      const s = energeticSpan(cycle(energies), { temperatureK: T }).span!;
      const ref = naiveSpan(ints.map(kcal), tss.map(kcal), kcal(dg), T);
      expect(rel(s.tof, ref.tof)).toBeLessThan(1e-9);
      expect(Math.abs(s.deltaEJ - ref.deltaEJ)).toBeLessThan(1e-6);
      s.transitionStates.forEach((x, i) => expect(Math.abs(x.xTof - ref.xTs[i]!)).toBeLessThan(1e-12 + 1e-9 * ref.xTs[i]!));
      s.intermediates.forEach((x, j) => expect(Math.abs(x.xTof - ref.xInt[j]!)).toBeLessThan(1e-12 + 1e-9 * ref.xInt[j]!));
      const sum = (xs: { xTof: number }[]) => xs.reduce((a, x) => a + x.xTof, 0);
      expect(sum(s.transitionStates)).toBeCloseTo(1, 12);
      expect(sum(s.intermediates)).toBeCloseTo(1, 12);
    }), { numRuns: 300 });
  });

  it('equals the steady-state flux of the Eyring step rates, and X_TOF(I) the populations', () => {
    // REFERENCE.md §6: the TOF is the steady-state flux of the Eyring k± cycle and X_TOF(int) = populations;
    // the reference solves that steady state by the matrix-tree theorem (King & Altman 1956, from memory).
    fc.assert(fc.property(randomCycle(-0.01), ({ energies }) => {
      const path = cycle(energies);
      const s = energeticSpan(path, { temperatureK: T }).span!;
      const steps = analyseSteps(path, { temperatureK: T }).steps;
      const ss = cycleSteadyState(steps.map((x) => x.kForward!), steps.map((x) => x.kReverse!));
      expect(rel(s.tof, ss.tof)).toBeLessThan(1e-9);
      s.intermediates.forEach((x, j) => expect(rel(x.xTof, ss.populations[j]!)).toBeLessThan(1e-9));
    }), { numRuns: 200 });
  });

  it('keeps a 10,000-point cycle spanning 600 kcal/mol finite and exact', () => {
    // 5,000 steps falling to ΔG_r = −600 kcal/mol: e^(600/RT) ≈ e^1013 would overflow a plain sum.
    const n = 5000;
    const energies: number[] = [];
    for (let i = 0; i < n; i++) energies.push(-0.12 * i, -0.12 * i + 10 + 8 * Math.abs(Math.sin(i)));
    energies.push(-600);
    const s = energeticSpan(cycle(energies), { temperatureK: T }).span!;
    expect(energies.length).toBe(10001);
    expect(Number.isFinite(s.tof) && s.tof > 0).toBe(true);
    const ints = energies.filter((_, k) => k % 2 === 0 && k < energies.length - 1);
    const tss = energies.filter((_, k) => k % 2 === 1);
    const ref = naiveSpan(ints.map(kcal), tss.map(kcal), kcal(-600), T);
    expect(rel(s.tof, ref.tof)).toBeLessThan(1e-9);
    // shifting every energy by +1000 kcal/mol changes nothing (the model uses differences only).
    const shifted = energeticSpan(cycle(energies.map((e) => e + 1000)), { temperatureK: T }).span!;
    expect(rel(shifted.tof, s.tof)).toBeLessThan(1e-9);
  });
});
