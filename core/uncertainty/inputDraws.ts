import type { Document } from '../model/schema.ts';
import { normalSampler } from './normalSampler.ts';
import { perturbDocument } from './perturbDocument.ts';
import { uncertainInputs, type UncertainInput } from './uncertainInputs.ts';

/** Default number of Monte Carlo samples. */
export const DEFAULT_SAMPLES = 10_000;
/** Seed used when the document names none. */
export const DEFAULT_SEED = 1;

/** N and seed of a run: asked for, else the document's, else the defaults. */
export function runSize(doc: Document, options: { samples?: number | undefined; seed?: number | undefined } = {}): { total: number; seed: number } {
  const total = Math.max(1, Math.floor(options.samples ?? doc.settings.uncertainty?.samples ?? DEFAULT_SAMPLES));
  const seed = options.seed ?? doc.settings.uncertainty?.seed ?? DEFAULT_SEED;
  return { total, seed };
}

/**
 * The standard normal deviates of a Monte Carlo run, drawn input by input in document order
 * and sample by sample, so one seed gives the same input errors to every result built on them
 * (the analysis, a temperature scan, a simulation): a sample's document is the same in each.
 */
export interface InputDraws {
  readonly inputs: UncertainInput[];
  readonly total: number;
  readonly seed: number;
  /** All deviates, sample-major (z[s·m + i] for input i of sample s); sample s is filled once `ensure(s)` ran. */
  readonly z: Float64Array;
  /** Draws every sample up to and including `s`. */
  ensure(s: number): void;
  /** Sample `s` as an ordinary document: each input moved by z·σ (log-normally for k and t½). */
  document(s: number): Document;
}

export function drawInputs(doc: Document, options: { samples?: number | undefined; seed?: number | undefined } = {}): InputDraws {
  const { total, seed } = runSize(doc, options);
  const inputs = uncertainInputs(doc);
  const m = inputs.length;
  const normal = normalSampler(seed);
  const z = new Float64Array(total * m);
  const deltas = new Float64Array(m);
  let drawn = 0;
  const ensure = (s: number) => {
    for (; drawn <= Math.min(s, total - 1); drawn++) for (let i = 0; i < m; i++) z[drawn * m + i] = normal();
  };
  return {
    inputs, total, seed, z, ensure,
    document(s) {
      ensure(s);
      for (let i = 0; i < m; i++) deltas[i] = z[s * m + i]! * inputs[i]!.sigma;
      return perturbDocument(doc, inputs, deltas);
    },
  };
}
