import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { networkFromReactions, simulate, type MassActionNetwork } from '../../../../core/kinetics/microkinetics/index.ts';
import stiffChain from '../../../fixtures/scipy/stiffChain.json' with { type: 'json' };

/** First-order chain X1 ⇌ X2 ⇌ … with the given (kf, kr) pairs. */
function chain(pairs: [number, number][]): MassActionNetwork {
  const r = networkFromReactions(pairs.map(([kf, kr], i) => ({ reactants: { [`X${i + 1}`]: 1 }, products: { [`X${i + 2}`]: 1 }, kf, kr })));
  if (!r.ok) throw new Error('bad chain');
  return r.network;
}

/**
 * Exact c(t) = exp(Kt)c₀ of a linear chain. K obeys detailed balance, so with D = diag(π)
 * (equilibrium populations) S = D^(−1/2) K D^(1/2) is symmetric and exp(Kt) = D^(1/2) V e^(Λt) Vᵀ D^(−1/2)
 * (standard linear algebra for reversible master equations; e.g. van Kampen, Stochastic
 * Processes in Physics and Chemistry, Ch. V, from memory). Eigenpairs from ml-matrix.
 */
function exactChain(pairs: [number, number][], c0: number[]): (t: number) => number[] {
  const n = pairs.length + 1;
  const pi = [1];
  pairs.forEach(([kf, kr]) => pi.push(pi.at(-1)! * (kf / kr)));
  const K = Matrix.zeros(n, n);
  pairs.forEach(([kf, kr], i) => {
    K.set(i, i, K.get(i, i) - kf); K.set(i + 1, i, kf);
    K.set(i + 1, i + 1, K.get(i + 1, i + 1) - kr); K.set(i, i + 1, kr);
  });
  const S = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) S.set(i, j, K.get(i, j) * Math.sqrt(pi[j]! / pi[i]!));
  const evd = new EigenvalueDecomposition(S, { assumeSymmetric: true });
  const V = evd.eigenvectorMatrix;
  const lambda = evd.realEigenvalues;
  const u0 = c0.map((c, i) => c / Math.sqrt(pi[i]!));
  const coef = lambda.map((_, k) => u0.reduce((s, u, i) => s + V.get(i, k) * u, 0));
  return (t) => Array.from({ length: n }, (_, i) =>
    Math.sqrt(pi[i]!) * lambda.reduce((s, l, k) => s + V.get(i, k) * coef[k]! * Math.exp(l * t), 0));
}

/**
 * Closed form for A ⇌ B ⇌ C from A₀ = 1, for rate constants far apart, where a floating-point
 * eigensolver loses the slow eigenvalue: the nonzero eigenvalues λ₁ + λ₂ = Σk,
 * λ₁λ₂ = k₁k₂ + k₋₁k₋₂ + k₁k₋₂ (taken without cancellation), and the amplitudes fixed by
 * A(0) = 1, A′(0) = −k₁, C(0) = C′(0) = 0 (derived; the same solution as in standard texts on
 * consecutive reversible first-order reactions, e.g. Espenson, Chemical Kinetics and
 * Reaction Mechanisms, 2nd ed. 1995, Ch. 4 — from memory).
 */
function exactThreeState(k1: number, km1: number, k2: number, km2: number): (t: number) => number[] {
  const sum = k1 + km1 + k2 + km2;
  const prod = k1 * k2 + km1 * km2 + k1 * km2;
  const l1 = (sum + Math.sqrt(sum * sum - 4 * prod)) / 2;
  const l2 = prod / l1;
  const a0 = (km1 * km2) / prod;
  const c0 = (k1 * k2) / prod;
  const a1 = (k1 - l2 * (1 - a0)) / (l1 - l2);
  const a2 = 1 - a0 - a1;
  const c1 = (c0 * l2) / (l1 - l2);
  const c2 = -c0 - c1;
  return (t) => {
    const e1 = Math.exp(-l1 * t);
    const e2 = Math.exp(-l2 * t);
    const a = a0 + a1 * e1 + a2 * e2;
    const c = c0 + c1 * e1 + c2 * e2;
    return [a, 1 - a - c, c];
  };
}

const R = 8.314462618153241; // J mol⁻¹ K⁻¹, CODATA 2018 (exact)

describe('linear networks against their exact solution', () => {
  const cases: [string, [number, number][], number][] = [
    ['A ⇌ B ⇌ C, k from 1e-3 to 1e4 s⁻¹', [[1e4, 1e1], [1e-1, 1e-3]], 2e4],
    ['A ⇌ B ⇌ C ⇌ D, k from 1e-3 to 1e5 s⁻¹', [[1e5, 1e2], [1e-1, 1e-3], [1e1, 1e0]], 2e4],
  ];
  it.each(cases)('%s matches exp(Kt)c₀ at 1e-6 relative', (_name, pairs, until) => {
    const network = chain(pairs);
    const exact = exactChain(pairs, [1, ...pairs.map(() => 0)]);
    const run = simulate(network, { X1: 1 }, { until, points: 120, rtol: 1e-11, atol: 1e-16 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const { times, concentrations } = run.simulation;
    expect(times.length).toBe(121);
    times.forEach((t, k) => exact(t).forEach((c, i) => {
      // 1e-6 relative, or 1e-12 mol/L absolute for components near zero.
      expect(Math.abs(concentrations[k]![i]! - c)).toBeLessThanOrEqual(1e-6 * Math.abs(c) + 1e-12);
    }));
  });

  it('A ⇌ B ⇌ C with k from 1e-6 to 1e10 s⁻¹ matches the closed form at 1e-6 relative', () => {
    const pairs: [number, number][] = [[1e10, 1e3], [1e-2, 1e-6]];
    const exact = exactThreeState(1e10, 1e3, 1e-2, 1e-6);
    const run = simulate(chain(pairs), { X1: 1 }, { until: 1e8, points: 150, rtol: 1e-11, atol: 1e-16 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    expect(run.simulation.times[1]).toBeLessThan(1e-11); // the log grid resolves the 1e-10 s relaxation
    run.simulation.times.forEach((t, k) => exact(t).forEach((c, i) => {
      expect(Math.abs(run.simulation.concentrations[k]![i]! - c)).toBeLessThanOrEqual(1e-6 * Math.abs(c) + 1e-12);
    }));
  });

  it('conserves mass at every reported time (Σc = c₀ for first-order isomerisations)', () => {
    const run = simulate(chain(cases[1]![1]), { X1: 0.7, X3: 0.3 }, { until: 1e4, rtol: 1e-9 });
    if (!run.ok) throw new Error('run failed');
    for (const row of run.simulation.concentrations) expect(row.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });

  it('keeps Σc = 1 to round-off in a stiff chain (k from 3e-5 to 3e9 s⁻¹, to 1e6 s) and matches exp(Kt)c₀ from mpmath', () => {
    // Found by a random search: without projection onto the conservation law the default
    // tolerances let Σc drift to 1 + 8e-8 (clipping of small negatives adds mass). Reference:
    // mpmath.expm at 60 digits (tests/fixtures/scipy/makeStiffChainFixture.py), because a
    // float64 eigensolver or scaling-and-squaring loses the slow modes over 14 decades of k.
    const pairs = stiffChain.pairs as [number, number][];
    const run = simulate(chain(pairs), { X1: 1 }, { until: 1e6, points: 60 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    for (const row of run.simulation.concentrations) expect(Math.abs(row.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(2e-15);
    const tight = simulate(chain(pairs), { X1: 1 }, { until: 1e6, from: 1e-9, points: 16, rtol: 1e-11, atol: 1e-18 });
    if (!tight.ok) throw new Error(JSON.stringify(tight.errors));
    for (const { t, c } of stiffChain.rows) {
      const k = tight.simulation.times.findIndex((x) => Math.abs(x / t - 1) < 1e-9);
      expect(k).toBeGreaterThanOrEqual(0);
      c.forEach((ci, i) => expect(Math.abs(tight.simulation.concentrations[k]![i]! - ci)).toBeLessThanOrEqual(1e-6 * Math.abs(ci) + 1e-15));
    }
  });

  // Detailed balance: at equilibrium [B]/[A] = K = kf/kr = exp(−ΔG/RT) (IUPAC Gold Book
  // "equilibrium constant"; law of mass action), here ΔG = −3 kcal/mol at 298.15 K.
  it('reaches the equilibrium K = exp(−ΔG/RT)', () => {
    const K = Math.exp((3 * 4184) / (R * 298.15));
    const run = simulate(chain([[0.5, 0.5 / K]]), { X1: 1 }, { until: 200, rtol: 1e-10 });
    if (!run.ok) throw new Error('run failed');
    const [a, b] = run.simulation.concentrations.at(-1)!;
    expect(b! / a! / K).toBeCloseTo(1, 7);
    expect(run.simulation.conversion.at(-1)).toBeCloseTo(K / (1 + K), 9);
  });

  it('holds a bimolecular equilibrium A + B ⇌ C at Kc = [C]/([A][B])', () => {
    const r = networkFromReactions([{ reactants: { A: 1, B: 1 }, products: { C: 1 }, kf: 20, kr: 0.5 }]);
    if (!r.ok) throw new Error('bad network');
    const run = simulate(r.network, { A: 0.1, B: 0.3 }, { until: 100, rtol: 1e-10 });
    if (!run.ok) throw new Error('run failed');
    const [a, b, c] = run.simulation.concentrations.at(-1)!;
    expect(c! / (a! * b!) / 40).toBeCloseTo(1, 7);
    expect(a! + c!).toBeCloseTo(0.1, 12); // A is conserved between free and bound forms
  });
});
