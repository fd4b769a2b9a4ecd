import { analyseDocument, analyseResolved, type DocumentAnalysis } from '../analysis/analyseDocument.ts';
import type { Document } from '../model/schema.ts';
import { derivedQuantities, type DerivedChoice, type DerivedQuantity } from './derivedQuantities.ts';
import { linearResolution } from './linearResolution.ts';
import { DEFAULT_SAMPLES, DEFAULT_SEED, drawInputs } from './inputDraws.ts';
import { frequencies, summarise, type Interval } from './summarise.ts';
import type { UncertainInput } from './uncertainInputs.ts';
import { varianceShares, type VarianceShare } from './varianceShares.ts';

export { DEFAULT_SAMPLES, DEFAULT_SEED };

export interface UncertaintyOptions {
  samples?: number | undefined;
  seed?: number | undefined;
  /** Sample every document in full even where the linear fast path applies (for checks). */
  full?: boolean | undefined;
}

/** A derived number with its point estimate and Monte Carlo interval (stored scale: J/mol, ln or plain). */
export type QuantityResult = Omit<DerivedQuantity, 'read'> & { point: number | null; interval: Interval | null };
/** A categorical result with the probability of each outcome. */
export type ChoiceResult = Omit<DerivedChoice, 'read'> & { point: string | null; probabilities: Record<string, number> };

/** Which inputs' uncertainties matter most for one pathway's rate. */
export interface RateSensitivity {
  pathway: string;
  /** ln TOF for a cycle, the effective barrier otherwise. */
  target: 'ln TOF' | 'effective barrier';
  shares: VarianceShare[];
}

/** Everything the Monte Carlo found. */
export interface UncertaintyResult {
  samples: number;
  seed: number;
  /** 'linear-resolution': resolved once per input, analysed per sample; 'full': every sample resolved and analysed. */
  method: 'linear-resolution' | 'full';
  inputs: UncertainInput[];
  quantities: QuantityResult[];
  choices: ChoiceResult[];
  sensitivity: RateSensitivity[];
}

/** A Monte Carlo run that can be advanced in slices (the app's worker reports progress between them). */
export interface UncertaintyRun {
  readonly total: number;
  readonly done: number;
  /** Draws and analyses up to `count` more samples. */
  step(count: number): void;
  /** Summaries over the samples drawn so far. */
  result(): UncertaintyResult;
}

/**
 * Monte Carlo propagation of the document's input uncertainties (normal deviates from a
 * seeded generator, σ as entered; rate constants and half-lives log-normal, see
 * `logNormalShift`). Each sample is the document with perturbed inputs run
 * through `analyseDocument` — resolution, the TS-below rule, effective barrier, energetic
 * span, comparisons, selectivity — or, when every input enters the resolution linearly,
 * through `analyseResolved` on the profile from `linearResolution` (same resolver, same
 * analysis). Samples are drawn input by input in document order, so a seed reproduces a run.
 */
export function startUncertainty(doc: Document, options: UncertaintyOptions = {}): UncertaintyRun {
  const draws = drawInputs(doc, options);
  const { total, seed, inputs, z } = draws;
  const m = inputs.length;
  const a0 = analyseDocument(doc);
  const { quantities, choices } = derivedQuantities(a0);
  const fast = options.full ? null : linearResolution(doc, inputs, a0.profile);
  const values = quantities.map(() => new Float64Array(total));
  const outcomes = choices.map(() => new Array<string | null>(total));
  let done = 0;
  const record = (s: number, a: DocumentAnalysis) => {
    for (let k = 0; k < quantities.length; k++) values[k]![s] = quantities[k]!.read(a) ?? Number.NaN;
    for (let k = 0; k < choices.length; k++) outcomes[k]![s] = choices[k]!.read(a);
  };
  return {
    total,
    get done() { return done; },
    step(count) {
      const end = Math.min(total, done + Math.max(0, Math.floor(count)));
      for (let s = done; s < end; s++) {
        draws.ensure(s);
        record(s, fast ? analyseResolved(doc, fast(z, s * m)) : analyseDocument(draws.document(s)));
      }
      done = end;
    },
    result() {
      const n = done;
      const scratch = new Float64Array(n);
      const quantityResults = quantities.map(({ read, ...rest }, k): QuantityResult => ({ ...rest, point: read(a0), interval: summarise(values[k]!.subarray(0, n), scratch) }));
      const choiceResults = choices.map(({ read, ...rest }, k): ChoiceResult => ({ ...rest, point: read(a0), probabilities: frequencies(outcomes[k]!.slice(0, n)) }));
      const sensitivity: RateSensitivity[] = [];
      a0.pathways.forEach((pa) => {
        const id = pa.pathway.id;
        const key = pa.energeticSpan ? `${id}/span/tof` : `${id}/effectiveBarrier`;
        const k = quantities.findIndex((q) => q.key === key);
        if (k < 0) return;
        sensitivity.push({ pathway: pa.pathway.name, target: pa.energeticSpan ? 'ln TOF' : 'effective barrier', shares: varianceShares(values[k]!.subarray(0, n), z.subarray(0, n * m), inputs) });
      });
      return { samples: n, seed, method: fast ? 'linear-resolution' : 'full', inputs, quantities: quantityResults, choices: choiceResults, sensitivity };
    },
  };
}

/** Runs all samples at once (CLI, tests): `startUncertainty(...)` stepped to the end. */
export function analyseUncertainty(doc: Document, options: UncertaintyOptions = {}): UncertaintyResult {
  const run = startUncertainty(doc, options);
  run.step(run.total);
  return run.result();
}
