import { setFlagsFromString } from 'node:v8';

/**
 * V8's optimising compiler (TurboFan) recompiles hot functions on background threads. A CLI run
 * that reads one small document and writes one figure ends before that pays back: turning it
 * off cut ≈ 10 % of the CPU of `render -o x.pdf` (tests/bench/cliBench.mjs, Node 20). So the
 * bundled CLI starts without it (bin.ts) and turns it back on, through `expectLongWork`, for
 * runs that compute for long: the solver, scans, batches, watching (`long` in main.ts's
 * COMMANDS), Monte Carlo runs (monteCarlo.ts) and large documents (largeWork.ts). Both only change how fast code runs, never what it computes.
 */
export function startShortRun(): void {
  setFlagsFromString('--no-opt');
}

let long = false;

/** Turns the optimising compiler back on for the rest of the process (idempotent). */
export function expectLongWork(): void {
  if (long) return;
  long = true;
  setFlagsFromString('--opt');
}
