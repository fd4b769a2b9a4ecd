import { checkIntegrateInput } from './checkIntegrateInput.ts';
import { errorNorm } from './errorNorm.ts';
import { initialStep } from './initialStep.ts';
import { RODAS3 } from './rodas3.ts';
import { makeWorkspace, rosenbrockStep } from './rosenbrockStep.ts';
import { clipNegatives } from './clipNegatives.ts';
import type { IntegrateOptions, IntegrationResult, JacobianFunction, RhsFunction, SolverFailureCode, SolverStats } from './solverTypes.ts';

const SAFETY = 0.9;
const MIN_FACTOR = 0.2;
const MAX_FACTOR = 6;

/**
 * Integrates the stiff autonomous system y′ = f(y) from tStart to tEnd with the L-stable
 * Rosenbrock method RODAS3 (Sandu et al., Atmos. Environ. 31, 3459 (1997); Hairer & Wanner,
 * Solving ODEs II, 1996, Sec. IV.7) and an analytic Jacobian, adapting the step to keep the
 * embedded local error estimate within rtol/atol (standard controller h·0.9·err^(−1/3),
 * Hairer & Wanner II, Sec. IV.8). With `outputTimes` it steps exactly onto each requested
 * time, so reported states carry full accuracy (no interpolation).
 * Failures (bad arguments, step-size underflow, step budget, non-finite values) come back
 * as `ok: false` with the part of the solution reached.
 */
export function integrate(
  rhs: RhsFunction, jacobian: JacobianFunction, y0: readonly number[] | Float64Array,
  tStart: number, tEnd: number, options: IntegrateOptions = {},
): IntegrationResult {
  const stats: SolverStats = { steps: 0, rejectedSteps: 0, jacobianEvaluations: 0, rhsEvaluations: 0, luDecompositions: 0 };
  const times: number[] = [];
  const states: Float64Array[] = [];
  const settings = checkIntegrateInput(y0, tStart, tEnd, options);
  const fail = (code: SolverFailureCode, message: string, t: number): IntegrationResult =>
    ({ ok: false, error: { code, message, t }, times, states, stats });
  if (typeof settings === 'string') return fail('invalid-input', settings, tStart);
  const { rtol, atol, outputTimes, maxSteps, maxStep, nonNegative } = settings;
  const n = y0.length;
  const ws = makeWorkspace(n, RODAS3);
  let y = Float64Array.from(y0);
  let yNew = new Float64Array(n);
  const f = new Float64Array(n);
  const err = new Float64Array(n);
  const jac = new Float64Array(n * n);
  const calls = { rhs: 1 };
  rhs(y, f);
  if (!f.every(Number.isFinite)) return fail('non-finite', 'the right-hand side is not finite at the initial state', tStart);
  let t = tStart;
  let next = 0;
  const record = (): void => { times.push(t); states.push(Float64Array.from(y)); };
  if (!outputTimes) record();
  while (outputTimes && next < outputTimes.length && outputTimes[next] === t) { record(); next++; }
  let h = Math.min(options.initialStep ?? initialStep(y, f, rtol, atol, tEnd - tStart), maxStep);
  let jacobianCurrent = false;
  let lastRejected = false;
  while (t < tEnd) {
    stats.rhsEvaluations = calls.rhs;
    if (stats.steps + stats.rejectedSteps >= maxSteps) return fail('max-steps', `stopped after ${maxSteps} steps at t = ${t}`, t);
    const target = outputTimes && next < outputTimes.length ? outputTimes[next]! : tEnd;
    const landing = t + h * 1.01 >= target;
    const hTry = landing ? target - t : h;
    if (!jacobianCurrent) {
      jac.fill(0);
      jacobian(y, jac);
      stats.jacobianEvaluations++;
      jacobianCurrent = true;
    }
    stats.luDecompositions++;
    const status = rosenbrockStep(RODAS3, rhs, y, f, jac, hTry, ws, yNew, err, calls);
    let factor: number;
    let accepted = false;
    if (status !== 'ok') {
      factor = 0.25;
    } else {
      const norm = errorNorm(err, y, yNew, rtol, atol);
      factor = norm === 0 ? MAX_FACTOR : Math.min(MAX_FACTOR, Math.max(MIN_FACTOR, SAFETY * norm ** (-1 / (RODAS3.embeddedOrder + 1))));
      accepted = norm <= 1 && (!nonNegative || clipNegatives(yNew, y, rtol, atol, nonNegative));
      if (norm <= 1 && !accepted) factor = 0.5;
    }
    if (accepted) {
      stats.steps++;
      t = landing ? target : t + hTry;
      [y, yNew] = [yNew, y];
      options.project?.(y);
      rhs(y, f);
      calls.rhs++;
      if (!f.every(Number.isFinite)) return fail('non-finite', `the right-hand side is not finite at t = ${t}`, t);
      jacobianCurrent = false;
      if (lastRejected) factor = Math.min(factor, 1);
      lastRejected = false;
      // A step shortened to land on an output time says nothing against the longer step.
      h = Math.min(maxStep, landing ? Math.max(h, hTry * factor) : hTry * factor);
      if (!outputTimes) record();
      const before = next;
      while (outputTimes && next < outputTimes.length && outputTimes[next]! <= t) { record(); next++; }
      if (outputTimes && next > before) options.onOutput?.(next, outputTimes.length);
    } else {
      stats.rejectedSteps++;
      lastRejected = true;
      h = hTry * factor;
      if (!(t + h > t)) {
        const why = status === 'ok' ? 'the error test keeps failing' : status === 'singular' ? 'the iteration matrix is singular' : 'the right-hand side gives non-finite values';
        return fail(status === 'non-finite' ? 'non-finite' : 'step-underflow', `step size underflow at t = ${t} (${why})`, t);
      }
    }
  }
  stats.rhsEvaluations = calls.rhs;
  return { ok: true, times, states, stats };
}
