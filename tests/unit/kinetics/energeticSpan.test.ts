import { describe, expect, it } from 'vitest';
import { analyseSteps, energeticSpan, SPAN_CONVENTION } from '../../../core/kinetics/index.ts';
import { cycle, kcal, pathway, rel, toKcal } from './build.ts';
import { naiveSpan } from './spanReference.ts';
import { cycleSteadyState } from './steadyState.ts';

const T = 298.15;
const KBT_H = 6.212437991620116e12; // REFERENCE.md §1, k_BT/h at 298.15 K (CODATA 2018, exact)
const RT = 8.31446261815324 * T; // REFERENCE.md §1, R (exact)

const A = [0, 12, -6, 15, -4.5, 16.5, -3, 8, -2];
const B = [0, 20, 4, 19, -10, -3, -18, -4, -16];
const C = [0, 14, -8, 12, -12, -5, -15];

function span(energies: number[], transmission = 1) {
  const r = energeticSpan(cycle(energies), { temperatureK: T, transmission });
  if (r.span === null) throw new Error(JSON.stringify(r.findings));
  return r.span;
}

const expectList = (got: number[], want: number[], tol: number) => got.forEach((g, i) => expect(rel(g, want[i]!)).toBeLessThan(tol));

describe('energeticSpan on the check cycles', () => {
  it('cycle A: TDTS after TDI, the −1 term matters', () => {
    // REFERENCE.md §6, Kozuch & Shaik ACR 2011, cycle A (mpmath values, steady state confirmed).
    const s = span(A);
    expect(rel(s.tof, 1.66434592407551e-4)).toBeLessThan(1e-9);
    expect(toKcal(s.deltaEJ)).toBeCloseTo(22.5, 9);
    expect([s.tdts.id, s.tdi.id, s.tdtsAfterTdi]).toEqual(['T3', 'I2', true]);
    expect(rel(s.tofApprox, 1.99823985763831e-4)).toBeLessThan(1e-9);
    expect(rel(toKcal(s.apparentBarrierJ!), 22.6083266979)).toBeLessThan(1e-10);
    expectList(s.transitionStates.map((x) => x.xTof), [1.612168663e-5, 0.06878445147, 0.9311988761, 5.507427872e-7], 1e-9);
    // X_TOF of the intermediates = steady-state populations (same section).
    expectList(s.intermediates.map((x) => x.xTof), [3.724871973e-5, 0.9309932243, 0.06876809744, 2.01429519e-4], 1e-9);
    expect(toKcal(s.reactionEnergyJ)).toBeCloseTo(-2, 12);
    expect(s.convention).toBe(SPAN_CONVENTION);
  });

  it('cycle B: TDTS before TDI, the wrap-around span', () => {
    // REFERENCE.md §6, Kozuch & Shaik ACR 2011, cycle B.
    const s = span(B);
    expect(rel(s.tof, 3.7918608875471e-4)).toBeLessThan(1e-9);
    expect(toKcal(s.deltaEJ)).toBeCloseTo(22.0, 9);
    expect([s.tdts.id, s.tdi.id, s.tdtsAfterTdi]).toEqual(['T1', 'I4', false]);
    expect(rel(s.tofApprox, 4.64675912709181e-4)).toBeLessThan(1e-9);
    expect(rel(toKcal(s.apparentBarrierJ!), 22.1204599618)).toBeLessThan(1e-10);
    expectList(s.transitionStates.map((x) => x.xTof), [0.8439294518, 0.1560694322, 8.253279442e-12, 1.11599471e-6], 1e-9);
    expectList(s.intermediates.map((x) => x.xTof), [0.03306608768, 6.034852068e-6, 1.322377664e-6, 0.9669265551], 1e-9);
  });

  it('mini-cycle C: the TDTS is not the highest TS, the TDI not the lowest intermediate', () => {
    // REFERENCE.md §6, mini-cycle C.
    const s = span(C);
    expect(rel(s.tof, 0.0135875845133288)).toBeLessThan(1e-9);
    expect(toKcal(s.deltaEJ)).toBeCloseTo(20.0, 9);
    expect([s.tdts.id, s.tdi.id]).toEqual(['T2', 'I2']);
    expect([s.tdtsByControl.id, s.tdiByControl.id]).toEqual(['T2', 'I2']);
    expect(rel(s.tofApprox, 0.0135881500478748)).toBeLessThan(1e-9);
    expectList(s.transitionStates.map((x) => x.xTof), [4.024318839e-5, 0.9999597565, 2.960897582e-10], 1e-9);
    expectList(s.intermediates.map((x) => x.xTof), [4.135754379e-5, 0.9999583806, 2.618365623e-7], 1e-9);
  });

  it('scales TOF and its approximation by κ', () => {
    const s = span(A, 0.5);
    expect(rel(s.tof, 0.5 * 1.66434592407551e-4)).toBeLessThan(1e-9);
    expect(rel(s.tofApprox, 0.5 * 1.99823985763831e-4)).toBeLessThan(1e-9);
    // the apparent barrier is measured against the same κ k_BT/h, so it does not move.
    expect(rel(toKcal(s.apparentBarrierJ!), 22.6083266979)).toBeLessThan(1e-10);
  });
});

describe('energeticSpan limits', () => {
  it('one-step cycle equals k₊ − k₋', () => {
    // REFERENCE.md §6: I₁ = 0, T₁ = 15, ΔG_r = −5 → 62.8191183451462 s⁻¹ (forces the i ≥ j rule).
    expect(rel(span([0, 15, -5]).tof, 62.8191183451462)).toBeLessThan(1e-9);
  });

  it('two-step cycle equals (k₁k₂ − k₋₁k₋₂)/(k₁ + k₋₁ + k₂ + k₋₂)', () => {
    // REFERENCE.md §6: I = 0, −3; T = 10, 12; ΔG_r = −4 → 62.348961782177 s⁻¹.
    expect(rel(span([0, 10, -3, 12, -4]).tof, 62.348961782177)).toBeLessThan(1e-9);
  });

  it('gives TOF = 0 exactly at ΔG_r = 0', () => {
    // REFERENCE.md §6: detailed balance, the numerator vanishes.
    const r = energeticSpan(cycle([0, 12, -6, 15, 0]), { temperatureK: T });
    expect(r.span?.tof).toBe(0);
    expect(r.span?.apparentBarrierJ).toBeNull();
    expect(r.findings.map((f) => f.code)).toEqual(['thermoneutral-cycle']);
  });

  it('gives the negative net rate of an endergonic one-step cycle with a finding', () => {
    // One-step limit of REFERENCE.md §6 with ΔG_r = +5: TOF = k₊ − k₋ = (k_BT/h)[e^(−15/RT) − e^(−10/RT)] < 0.
    const r = energeticSpan(cycle([0, 15, 5]), { temperatureK: T });
    const expected = KBT_H * (Math.exp(-kcal(15) / RT) - Math.exp(-kcal(10) / RT));
    expect(rel(r.span!.tof, expected)).toBeLessThan(1e-9);
    expect(r.span!.tof).toBeLessThan(0);
    expect(r.findings.map((f) => [f.code, f.severity])).toEqual([['endergonic-cycle', 'warning']]);
  });
});

describe('energeticSpan is not a wrong convention', () => {
  // REFERENCE.md §6 wrong-convention detector [derived]: strict i > j gives 1.918488623e-4 (A)
  // and 3.900741488e-4 (B); the correction on the wrong side gives 9.33e-4 (A), 7.3e-16 (B).
  const states = (e: number[]) => ({ ints: e.filter((_, k) => k % 2 === 0 && k < e.length - 1).map(kcal), tss: e.filter((_, k) => k % 2 === 1).map(kcal), dg: kcal(e[e.length - 1]!) });
  it('the naive wrong rules reproduce the detector values', () => {
    const a = states(A);
    const b = states(B);
    expect(rel(naiveSpan(a.ints, a.tss, a.dg, T, 'i>j').tof, 1.918488623e-4)).toBeLessThan(1e-9);
    expect(rel(naiveSpan(b.ints, b.tss, b.dg, T, 'i>j').tof, 3.900741488e-4)).toBeLessThan(1e-9);
    expect(rel(naiveSpan(a.ints, a.tss, a.dg, T, 'wrong-side').tof, 9.33e-4)).toBeLessThan(1e-3);
    expect(rel(naiveSpan(b.ints, b.tss, b.dg, T, 'wrong-side').tof, 7.3e-16)).toBeLessThan(1e-2);
  });

  it('the implementation gives none of them', () => {
    for (const e of [A, B]) {
      const s = states(e);
      const ours = span(e).tof;
      expect(rel(ours, naiveSpan(s.ints, s.tss, s.dg, T, 'i>=j').tof)).toBeLessThan(1e-12);
      expect(rel(ours, naiveSpan(s.ints, s.tss, s.dg, T, 'i>j').tof)).toBeGreaterThan(0.02);
      expect(rel(ours, naiveSpan(s.ints, s.tss, s.dg, T, 'wrong-side').tof)).toBeGreaterThan(0.5);
    }
  });
});

describe('energeticSpan input rules', () => {
  it('treats two intermediates in a row as a barrierless step at the higher one', () => {
    const implicit = energeticSpan(pathway([['I1', 'min', 0], ['I2', 'min', 5], ['T2', 'ts', 15], ['I1′', 'min', -3]], { cycle: true }), { temperatureK: T });
    const explicit = span([0, 5, 5, 15, -3]);
    expect(rel(implicit.span!.tof, explicit.tof)).toBeLessThan(1e-14);
    expect(implicit.span!.transitionStates[0]).toMatchObject({ id: 'I1→I2', origin: 'barrierless', energyJ: kcal(5) });
  });

  it('raises a TS that lies below a neighbour, with a warning', () => {
    const r = energeticSpan(pathway([['I1', 'min', 0], ['T1', 'ts', -1], ['I2', 'min', -4], ['T2', 'ts', 15], ['I1′', 'min', -3]], { cycle: true }), { temperatureK: T });
    expect(r.findings.map((f) => [f.code, f.point])).toEqual([['ts-below-neighbour', 'T1']]);
    expect(rel(r.span!.tof, span([0, 0, -4, 15, -3]).tof)).toBeLessThan(1e-14);
    expect(r.span!.transitionStates[0]?.origin).toBe('raised');
  });

  it('rejects cycles it cannot read, naming the point', () => {
    const codes = (specs: Parameters<typeof pathway>[0]) => energeticSpan(pathway(specs, { cycle: true }), { temperatureK: T }).findings.map((f) => [f.code, f.point]);
    expect(codes([['I1', 'min', 0], ['T1', 'ts', 9], ['T2', 'ts', 10], ['I1′', 'min', -2]])).toEqual([['consecutive-ts', 'T2']]);
    expect(codes([['T0', 'ts', 5], ['I1', 'min', 0], ['T1', 'ts', 9], ['I1′', 'min', -2]])).toEqual([['cycle-starts-with-ts', 'T0']]);
    expect(codes([['I1', 'min', 0], ['T1', 'ts', 9], ['I2', 'min', -2], ['T2', 'ts', 8]])).toEqual([['cycle-not-closed', 'T2']]);
    expect(codes([['I1', 'min', 0], ['T1', 'ts', 9]])).toEqual([['cycle-too-short', undefined]]);
    expect(codes([['I1', 'min', 0], ['T1', 'ts', null], ['I1′', 'min', -2]])).toEqual([['energy-missing', 'T1']]);
    expect(energeticSpan(cycle(A), { temperatureK: 0 }).findings.map((f) => f.code)).toEqual(['bad-temperature']);
  });
});

describe('cycleSteadyState test reference', () => {
  it('reproduces the steady-state populations and flux of cycle A', () => {
    // REFERENCE.md §6 cycle A: steady-state populations and TOF (numpy/mpmath master equation).
    const steps = analyseSteps(cycle(A), { temperatureK: T }).steps;
    const ss = cycleSteadyState(steps.map((s) => s.kForward!), steps.map((s) => s.kReverse!));
    expectList(ss.populations, [3.724871973e-5, 0.9309932243, 0.06876809744, 2.01429519e-4], 1e-9);
    expect(rel(ss.tof, 1.66434592407551e-4)).toBeLessThan(1e-9);
  });
});

describe('the δE approximation follows the exact TOF\'s sign', () => {
  it('is negative for an endergonic cycle, 0 at ΔG_r = 0, and quotes ΔG_r in the display unit', async () => {
    const { energeticSpan } = await import('../../../core/kinetics/index.ts');
    const { cycle } = await import('./build.ts');
    const up = energeticSpan(cycle([0, 20, 5, 18, 3]), { temperatureK: 298.15, unit: 'kcal/mol' });
    expect(up.span!.tof).toBeLessThan(0);
    expect(up.span!.tofApprox).toBeLessThan(0);
    expect(up.findings.find((f) => f.code === 'endergonic-cycle')?.message).toContain('3.00 kcal/mol');
    const flat = energeticSpan(cycle([0, 20, 5, 18, 0]), { temperatureK: 298.15 });
    expect([flat.span!.tof, flat.span!.tofApprox]).toEqual([0, 0]);
  });
});
