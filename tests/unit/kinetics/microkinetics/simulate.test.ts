import { describe, expect, it } from 'vitest';
import { networkFromPathway, simulate } from '../../../../core/kinetics/microkinetics/index.ts';
import { cycleA, cycleB } from './pathwayBuilder.ts';
import { fixtureNetwork, scipyFixture, worstMismatch } from './scipyFixture.ts';

function cycleNetwork(path: typeof cycleA) {
  const r = networkFromPathway(path, { temperatureK: 298.15 });
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.network;
}

describe('simulate: steady-state TOF of catalytic cycles', () => {
  // REFERENCE.md §6, Kozuch & Shaik ACR 2011: exact TOF of cycle A 1.66434592407551e-4 s⁻¹ and
  // steady-state populations; slowest relaxation 3.663e-2 s⁻¹, so 2000 s is ~70 relaxation times.
  it('reads cycle A’s TOF from the turnover slope', () => {
    const run = simulate(cycleNetwork(cycleA), { I1: 1 }, { until: 2000, rtol: 1e-9 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const sim = run.simulation;
    expect(Math.abs(sim.steadyStateTof! / 1.66434592407551e-4 - 1)).toBeLessThan(1e-6);
    const p = [3.724871973e-5, 0.9309932243, 0.06876809744, 2.01429519e-4];
    sim.concentrations.at(-1)!.forEach((c, i) => expect(c / p[i]!).toBeCloseTo(1, 7));
    expect(sim.turnovers!.at(-1)).toBeGreaterThan(0.25); // ~2000 s × 1.66e-4 s⁻¹ less the start-up
    expect(sim.findings).toEqual([]);
  });

  // REFERENCE.md §6, cycle B (TDTS before TDI): exact TOF 3.7918608875471e-4 s⁻¹; slowest relaxation 74 s⁻¹.
  it('reads cycle B’s TOF from the turnover slope', () => {
    const run = simulate(cycleNetwork(cycleB), { I1: 1 }, { until: 20, rtol: 1e-9 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    expect(Math.abs(run.simulation.steadyStateTof! / 3.7918608875471e-4 - 1)).toBeLessThan(1e-6);
    expect(run.simulation.concentrations.at(-1)![3]! / 0.9669265551).toBeCloseTo(1, 7);
  });

  it('reads no TOF from a run too short for any turnover to register (10⁻¹⁵ s), and says so', () => {
    const run = simulate(cycleNetwork(cycleA), { I1: 1 }, { until: 1e-15 });
    if (!run.ok) throw new Error('simulation failed');
    expect(run.simulation.steadyStateTof).toBeUndefined();
    expect(run.simulation.findings.map((f) => f.code)).toContain('microkinetics-not-steady');
  });

  it('gives no TOF, but a finding, before the cycle settles', () => {
    const run = simulate(cycleNetwork(cycleA), { I1: 1 }, { until: 10 });
    if (!run.ok) throw new Error('run failed');
    expect(run.simulation.steadyStateTof).toBeUndefined();
    expect(run.simulation.findings[0]).toMatchObject({ code: 'microkinetics-not-steady', severity: 'warning' });
  });

  it('scales turnovers per catalyst, independent of the catalyst loading', () => {
    const run = simulate(cycleNetwork(cycleB), { I1: 0.002, I4: 0.003 }, { until: 20, rtol: 1e-9, atol: 1e-18 });
    if (!run.ok) throw new Error('run failed');
    expect(Math.abs(run.simulation.steadyStateTof! / 3.7918608875471e-4 - 1)).toBeLessThan(1e-6);
  });
});

describe('simulate against SciPy solve_ivp (Radau, rtol 1e-10)', () => {
  // Tolerance: 1e-4 relative with an absolute floor of 1e-12 × the total initial concentration,
  // for components that pass through ~1e-14 of the total (where Radau and BDF themselves differ).
  it('matches the 10-step stiff cycle (k from 1e-6 to 1e10 s⁻¹) to 1e5 s', () => {
    const fx = scipyFixture.problems.stiffCycle!;
    const network = fixtureNetwork(fx);
    const run = simulate(network, { X1: fx.initial[0]! }, { until: 1e5, from: 1e-12, points: fx.times.length - 1, rtol: 1e-8, atol: 1e-19 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const sim = run.simulation;
    sim.times.forEach((t, k) => expect(Math.abs(t - fx.times[k]!)).toBeLessThanOrEqual(1e-14 * t));
    const ours = sim.concentrations.map((row, k) => [...row, sim.turnovers![k]! * fx.initial[0]!]);
    expect(worstMismatch(ours, fx.states, 1e-4, 1e-12 * fx.initial[0]!)).toBeLessThanOrEqual(1);
  });

  it('matches the bimolecular network A + B ⇌ C → D (mol/L)', () => {
    const fx = scipyFixture.problems.bimolecular!;
    const initial = Object.fromEntries(fx.species.map((s, i) => [s, fx.initial[i]!]));
    const run = simulate(fixtureNetwork(fx), initial, { until: 1e3, from: 1e-6, points: fx.times.length - 1, rtol: 1e-8 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    expect(worstMismatch(run.simulation.concentrations, fx.states, 1e-4, 1e-12 * 0.25)).toBeLessThanOrEqual(1);
    // A is the limiting reagent (0.10 vs 0.15 mol/L) and C → D is irreversible: full conversion.
    expect(run.simulation.reference).toBe('A');
    expect(run.simulation.conversion.at(-1)).toBeCloseTo(1, 9);
  });

  it('matches Robertson’s problem built as a mass-action network', () => {
    const fx = scipyFixture.problems.robertson!;
    const times = fx.times;
    const run = simulate(fixtureNetwork(fx), { y1: 1 }, { until: 4e10, from: times[1]!, points: times.length - 1, rtol: 1e-8, atol: 1e-20 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    expect(worstMismatch(run.simulation.concentrations, fx.states, 1e-4, 1e-14)).toBeLessThanOrEqual(1);
  });
});

describe('simulate input', () => {
  const network = cycleNetwork(cycleA);
  it.each([
    [{ X9: 1 }, { until: 10 }, 'initial.X9'],
    [{ I1: -1 }, { until: 10 }, 'initial.I1'],
    [{}, { until: 10 }, 'initial'],
    [{ I1: 1 }, { until: 0 }, 'options.until'],
    [{ I1: 1 }, { until: 10, points: 1 }, 'options.points'],
    [{ I1: 1 }, { until: 10, reference: 'I2' }, 'options.reference'],
  ] as const)('names the bad field (%#)', (initial, options, path) => {
    const run = simulate(network, initial, options);
    expect(run.ok).toBe(false);
    if (!run.ok) expect(run.errors.map((e) => e.path)).toContain(path);
  });

  it('reports a solver failure as an error value', () => {
    const run = simulate(network, { I1: 1 }, { until: 2000, maxSteps: 5 });
    expect(!run.ok && run.errors[0]!.message).toMatch(/max-steps/);
  });

  it('spaces reported times linearly when asked', () => {
    const run = simulate(network, { I1: 1 }, { until: 10, points: 5, logTime: false });
    expect(run.ok && run.simulation.times).toEqual([0, 2, 4, 6, 8, 10]);
  });
});
