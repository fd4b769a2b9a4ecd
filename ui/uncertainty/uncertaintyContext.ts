import { getContext, setContext } from 'svelte';
import type { ErrorBarRanges } from '../../core/figure/errorBars.ts';
import type { Document } from '../../core/model/schema.ts';
import { errorBarRanges } from '../../core/uncertainty/errorBarRanges.ts';
import type { UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import type { UncertaintyRunner } from './uncertaintyRunner.svelte.ts';

const KEY = Symbol('uncertainty runner');

/** Makes the app's one Monte Carlo runner available to the panels below (App calls this). */
export function setUncertaintyRunner(runner: UncertaintyRunner): UncertaintyRunner {
  return setContext(KEY, runner);
}

/** The app's Monte Carlo runner, if one was set above. */
export function getUncertaintyRunner(): UncertaintyRunner | undefined {
  return getContext<UncertaintyRunner | undefined>(KEY);
}

/** The finished Monte Carlo result for `doc`: only one that belongs to this document's inputs, else none. */
export function resultFor(runner: UncertaintyRunner | undefined, doc: Document): UncertaintyResult | undefined {
  return runner?.result && runner.resultDoc === doc ? runner.result : undefined;
}

/** The figure's error bars for `doc`: only from a result that belongs to this document's inputs, else none. */
export function errorBarsFor(runner: UncertaintyRunner | undefined, doc: Document): ErrorBarRanges | undefined {
  const mode = doc.figure.errorBars;
  const result = resultFor(runner, doc);
  return mode && result ? errorBarRanges(result, mode) : undefined;
}
