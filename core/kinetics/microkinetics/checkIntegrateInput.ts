import type { IntegrateOptions } from './solverTypes.ts';

/** Settled solver settings after defaults. */
export interface SolverSettings {
  rtol: number;
  atol: Float64Array;
  outputTimes: readonly number[] | undefined;
  maxSteps: number;
  maxStep: number;
  /** 1 where a component is kept ≥ 0, or undefined when none is. */
  nonNegative: Uint8Array | undefined;
}

/** Checks the arguments of `integrate`; returns a message naming the bad argument, or the settings. */
export function checkIntegrateInput(
  y0: readonly number[] | Float64Array, tStart: number, tEnd: number, options: IntegrateOptions,
): SolverSettings | string {
  const n = y0.length;
  if (!Number.isFinite(tStart) || !Number.isFinite(tEnd) || !(tEnd > tStart)) {
    return `the end time (${tEnd}) must be a finite number after the start time (${tStart})`;
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(y0[i]!)) return `initial value ${i} is not a finite number`;
  const rtol = options.rtol ?? 1e-6;
  if (!(rtol >= 1e-14 && rtol < 1)) return `rtol must lie in [1e-14, 1), got ${rtol}`;
  const atolIn = options.atol ?? 1e-12;
  const atol = new Float64Array(n);
  if (typeof atolIn === 'number') atol.fill(atolIn);
  else if (atolIn.length !== n) return `atol has ${atolIn.length} entries for ${n} components`;
  else atol.set(atolIn);
  for (let i = 0; i < n; i++) if (!(atol[i]! > 0) || !Number.isFinite(atol[i]!)) return `atol must be positive and finite (component ${i})`;
  const outputTimes = options.outputTimes;
  if (outputTimes) {
    for (let k = 0; k < outputTimes.length; k++) {
      const t = outputTimes[k]!;
      if (!(t >= tStart && t <= tEnd)) return `output time ${t} lies outside [${tStart}, ${tEnd}]`;
      if (k > 0 && !(t > outputTimes[k - 1]!)) return `output times must increase (entry ${k}: ${t})`;
    }
  }
  const maxSteps = options.maxSteps ?? 100_000;
  if (!(Number.isInteger(maxSteps) && maxSteps > 0)) return `maxSteps must be a positive integer, got ${maxSteps}`;
  const maxStep = options.maxStep ?? Infinity;
  if (!(maxStep > 0)) return `maxStep must be positive, got ${maxStep}`;
  const flags = options.nonNegative ?? false;
  if (typeof flags !== 'boolean' && flags.length !== n) return `nonNegative has ${flags.length} flags for ${n} components`;
  const nonNegative = flags === false ? undefined : Uint8Array.from({ length: n }, (_, i) => (flags === true || flags[i] ? 1 : 0));
  return { rtol, atol, outputTimes, maxSteps, maxStep, nonNegative };
}
