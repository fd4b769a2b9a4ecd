import { analyseUncertainty } from '../uncertainty/uncertaintyRun.ts';
import { expectLongWork } from './compilerTier.ts';

/**
 * The CLI's one way into a Monte Carlo run (analyze, tables, report, render's error bars): it
 * turns V8's optimising compiler back on first (compilerTier.ts), since thousands of samples
 * through the analysis are the long work it pays back on.
 */
export function monteCarlo(...args: Parameters<typeof analyseUncertainty>): ReturnType<typeof analyseUncertainty> {
  expectLongWork();
  return analyseUncertainty(...args);
}
