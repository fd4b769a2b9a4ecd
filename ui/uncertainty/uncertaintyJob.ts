import type { Document } from '../../core/model/schema.ts';
import { startUncertainty, type UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import { startConformerUncertainty, type ConformerIntervals } from '../../core/uncertainty/conformerUncertainty.ts';

/** A Monte Carlo run that can be advanced in slices (progress and cancelling between them). */
export interface SampledRun<R> {
  readonly total: number;
  readonly done: number;
  step(count: number): void;
  result(): R;
}

/**
 * What each kind of background job takes beside the document and gives back. Every kind
 * samples the same document inputs from the same seed (core/uncertainty/inputDraws.ts).
 */
export interface JobKinds {
  /** Intervals of the analysis (the app's shared runner: panel, figure, exports). */
  analysis: { params: null; result: UncertaintyResult };
  /** Population intervals of one species' conformers (the species sheet's conformer table). */
  conformers: { params: { species: string }; result: ConformerIntervals };
}
export type JobKind = keyof JobKinds;
type Starter<K extends JobKind> = (doc: Document, size: { samples: number; seed: number }, params: JobKinds[K]['params']) => SampledRun<JobKinds[K]['result']>;

const STARTERS: { [K in JobKind]: Starter<K> } = {
  analysis: (doc, size) => startUncertainty(doc, size),
  conformers: (doc, size, params) => startConformerUncertainty(doc, params.species, size),
};

/** A request to the sampler: the kind, the document (a plain object), the run's size and seed. */
export interface UncertaintyJob<K extends JobKind = JobKind> { id: number; kind: K; doc: Document; samples: number; seed: number; params: JobKinds[K]['params'] }

/** What the sampler reports back. */
export type UncertaintyMessage<K extends JobKind = JobKind> =
  | { id: number; kind: 'progress'; done: number; total: number }
  | { id: number; kind: 'result'; result: JobKinds[K]['result'] }
  | { id: number; kind: 'error'; message: string };

/** Samples per slice: small enough that a newer job or a cancel is seen within ~0.1 s. */
const SLICE = 250;

/**
 * Runs one job in slices, reporting progress after each and yielding to the event loop so a
 * newer job can supersede it (`isCurrent` turns false): the same loop serves the Web Worker
 * and, where workers are unavailable, the page itself. `slice` is the samples per slice
 * (fewer for kinds whose sample is costly, such as a whole scan or a simulation).
 */
export async function runJob<K extends JobKind>(job: UncertaintyJob<K>, post: (m: UncertaintyMessage<K>) => void, isCurrent: () => boolean, slice = SLICE): Promise<void> {
  try {
    const start = STARTERS[job.kind] as Starter<K>;
    const run = start(job.doc, { samples: job.samples, seed: job.seed }, job.params);
    while (run.done < run.total) {
      await new Promise((resolve) => setTimeout(resolve, 0));
      if (!isCurrent()) return;
      run.step(slice);
      post({ id: job.id, kind: 'progress', done: run.done, total: run.total });
    }
    if (isCurrent()) post({ id: job.id, kind: 'result', result: run.result() });
  } catch (error) {
    post({ id: job.id, kind: 'error', message: (error as Error).message });
  }
}
