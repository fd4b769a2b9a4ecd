import type { Document } from '../../core/model/schema.ts';
import { startUncertainty, type UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';

/** A request to the sampler: the document (a plain object) and the run's size and seed. */
export interface UncertaintyJob { id: number; doc: Document; samples: number; seed: number }

/** What the sampler reports back. */
export type UncertaintyMessage =
  | { id: number; kind: 'progress'; done: number; total: number }
  | { id: number; kind: 'result'; result: UncertaintyResult }
  | { id: number; kind: 'error'; message: string };

/** Samples per slice: small enough that a newer job or a cancel is seen within ~0.1 s. */
const SLICE = 250;

/**
 * Runs one job in slices, reporting progress after each and yielding to the event loop so a
 * newer job can supersede it (`isCurrent` turns false): the same loop serves the Web Worker
 * and, where workers are unavailable, the page itself.
 */
export async function runJob(job: UncertaintyJob, post: (m: UncertaintyMessage) => void, isCurrent: () => boolean): Promise<void> {
  try {
    const run = startUncertainty(job.doc, { samples: job.samples, seed: job.seed });
    while (run.done < run.total) {
      await new Promise((resolve) => setTimeout(resolve, 0));
      if (!isCurrent()) return;
      run.step(SLICE);
      post({ id: job.id, kind: 'progress', done: run.done, total: run.total });
    }
    if (isCurrent()) post({ id: job.id, kind: 'result', result: run.result() });
  } catch (error) {
    post({ id: job.id, kind: 'error', message: (error as Error).message });
  }
}
