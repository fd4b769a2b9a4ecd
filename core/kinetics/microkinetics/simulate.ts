import type { Finding } from '../../profile/types.ts';
import { checkSimulateInput } from './checkSimulateInput.ts';
import { compileNetwork } from './compileNetwork.ts';
import { fastestRate } from './fastestRate.ts';
import type { MassActionNetwork } from './network.ts';
import type { SimulateOptions, Simulation, SimulationOutcome } from './simulationTypes.ts';
import { integrate } from './stiffSolver.ts';
import { conservationLaws } from './conservationLaws.ts';
import { invariantProjection } from './invariantProjection.ts';
import { firstLogTime, timeGrid } from './timeGrid.ts';
import { turnoverSlope } from './turnoverSlope.ts';

/** Fewest turnovers per catalyst in the window from which a TOF is read. */
const MIN_TURNOVERS = 1e-6;

/** Slope and end-point rate must agree this closely to call the cycle steady. */
const STEADY_AGREEMENT = 1e-3;

/**
 * Integrates a mass-action network from the given initial concentrations (mol/L; species
 * not named start at 0) with the stiff Rosenbrock solver, reporting concentrations,
 * conversion of the reference species and — for cycles — cumulative turnovers and the
 * steady-state TOF as the long-time slope of turnovers per catalyst (Kozuch & Shaik,
 * Acc. Chem. Res. 44, 101 (2011)). A TOF is given only when the slope over the last
 * `tofWindow` of the run matches the net rate at the end; otherwise a finding says to run longer.
 * After every step the state is projected back onto the network's linear conservation laws
 * (total catalyst, atoms of each kind), so they hold to round-off rather than to the tolerance.
 */
export function simulate(network: MassActionNetwork, initial: Record<string, number>, options: SimulateOptions): SimulationOutcome {
  const errors = checkSimulateInput(network, initial, options);
  if (errors.length > 0) return { ok: false, errors };
  const { until, points = 200, logTime = true, rtol = 1e-8, tofWindow = 0.2 } = options;
  const compiled = compileNetwork(network);
  const c0 = network.species.map((s) => initial[s] ?? 0);
  const total = c0.reduce((a, b) => a + b, 0);
  const atol = options.atol ?? 1e-14 * total;
  const from = options.from ?? firstLogTime(until, points, fastestRate(network, Math.max(...c0)));
  const grid = timeGrid(until, points, logTime, from);
  const windowStart = until * (1 - tofWindow);
  const solverTimes = [...new Set([...grid, windowStart])].sort((a, b) => a - b);
  const y0 = compiled.tallyIndex >= 0 ? [...c0, 0] : c0;
  const nonNegative = y0.map((_, i) => i !== compiled.tallyIndex);
  const laws = conservationLaws(compiled.netChanges, compiled.speciesCount);
  const project = invariantProjection(laws, c0, c0.map(() => atol));
  const run = integrate(compiled.rhs, compiled.jacobian, y0, 0, until, { rtol, atol, outputTimes: solverTimes, nonNegative, maxSteps: options.maxSteps, project, onOutput: options.onProgress });
  if (!run.ok) return { ok: false, errors: [{ path: 'solver', message: `${run.error.message} (${run.error.code}); try a looser tolerance or a shorter time` }] };
  const keep = run.times.map((t) => grid.includes(t));
  const times = run.times.filter((_, k) => keep[k]);
  const states = run.states.filter((_, k) => keep[k]);
  const reference = options.reference ?? network.species[c0.findIndex((c) => c > 0)]!;
  const ref = network.species.indexOf(reference);
  const simulation: Simulation = {
    times,
    species: [...network.species],
    labels: [...network.labels],
    concentrations: states.map((s) => Array.from(s.subarray(0, compiled.speciesCount))),
    conversion: states.map((s) => 1 - s[ref]! / c0[ref]!),
    reference,
    findings: [],
    stats: run.stats,
  };
  if (compiled.tallyIndex >= 0) readTurnovers(network, compiled, run.times, run.states, windowStart, atol, simulation);
  return { ok: true, simulation };
}

function readTurnovers(
  network: MassActionNetwork, compiled: ReturnType<typeof compileNetwork>, times: number[], states: Float64Array[],
  windowStart: number, atol: number, simulation: Simulation,
): void {
  const catalyst = network.catalyst ?? network.species;
  const index = catalyst.map((s) => network.species.indexOf(s));
  const catalystTotal = index.reduce((sum, i) => sum + states[0]![i]!, 0);
  const tally = compiled.tallyIndex;
  simulation.turnovers = simulation.times.map((t) => states[times.indexOf(t)]![tally]! / catalystTotal);
  if (!(catalystTotal > 0)) return;
  const k0 = times.indexOf(windowStart);
  const last = states[states.length - 1]!;
  const t1 = times[times.length - 1]!;
  const slope = turnoverSlope(windowStart, states[k0]![tally]!, t1, last[tally]!, catalystTotal);
  const endRate = compiled.netRate(network.turnoverReaction!, last) / catalystTotal;
  const floor = (10 * atol) / (catalystTotal * (t1 - windowStart));
  // A window with fewer than 10⁻⁶ turnovers per catalyst holds no TOF: the count is then the
  // start-up transient and the solver's error, not a steady rate (at 10⁻¹⁵ s it read −3 × 10⁵ s⁻¹).
  // The threshold is our choice, far below any run that is meant to reach steady state.
  if (Math.abs(last[tally]! - states[k0]![tally]!) / catalystTotal < MIN_TURNOVERS) {
    simulation.findings.push(notSteady(slope, endRate, t1));
    return;
  }
  if (Math.abs(slope - endRate) <= STEADY_AGREEMENT * Math.max(Math.abs(slope), Math.abs(endRate)) + floor) {
    simulation.steadyStateTof = slope;
  } else {
    simulation.findings.push(notSteady(slope, endRate, t1));
  }
}

function notSteady(slope: number, endRate: number, until: number): Finding {
  return {
    severity: 'warning',
    code: 'microkinetics-not-steady',
    message: `the cycle has not reached steady state by ${until.toPrecision(3)} s (turnover slope ${slope.toPrecision(4)} s⁻¹ vs rate at the end ${endRate.toPrecision(4)} s⁻¹); simulate for longer to read a TOF`,
  };
}
