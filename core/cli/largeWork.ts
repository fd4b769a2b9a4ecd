import { BOUNDS } from '../model/bounds.ts';
import type { Document } from '../model/schema.ts';
import type { CliIo } from './io.ts';
import { expectLongWork } from './compilerTier.ts';

const pointCount = (doc: Document) => doc.pathways.reduce((n, p) => n + p.points.length, 0);

/**
 * Says on stderr, before the work starts, that a document beyond the usual number of points
 * will take a while (up to the hard limit it still runs; see BOUNDS.pointCount), and lets
 * V8 optimise for it (compilerTier.ts).
 */
export function noteLargeWork(command: string, doc: Document, io: CliIo): void {
  const points = pointCount(doc);
  if (points > BOUNDS.pointCount.usual[1]) {
    expectLongWork();
    io.err(`passline ${command}: ${points} points (more than the usual ${BOUNDS.pointCount.usual[1]}); this may take a while…\n`);
  }
}

/**
 * For a document beyond the usual number of points, a reporter that writes "done/total"
 * progress lines on stderr as long work advances; undefined for ordinary documents.
 */
export function largeWorkProgress(command: string, doc: Document, io: CliIo, what: string): ((done: number, total: number) => void) | undefined {
  if (pointCount(doc) <= BOUNDS.pointCount.usual[1]) return undefined;
  return (done, total) => io.err(`passline ${command}: ${done}/${total} ${what}\n`);
}

/**
 * For a document beyond the usual number of points, a reporter of the stages of one long
 * piece of work whose parts cannot be counted (a figure's layout is one search): each call
 * writes "stage… (t s)" on stderr with the time since the reporter was made; ordinary
 * documents get a reporter that prints nothing.
 */
export function largeWorkStages(command: string, doc: Document, io: CliIo, now: () => number = Date.now): (stage: string) => void {
  if (pointCount(doc) <= BOUNDS.pointCount.usual[1]) return () => {};
  const start = now();
  return (stage) => io.err(`passline ${command}: ${stage}… (${((now() - start) / 1000).toFixed(1)} s)\n`);
}

/** Seconds of silence before the first progress line, and between lines. */
const PROGRESS_EVERY_MS = 1000;

/**
 * A reporter for work whose length shows only as it runs (a stiff simulation): a line on
 * stderr with the share of `what` done, once the work has run a second, then at most once a
 * second, so quick runs print nothing. `now` is the clock (tests pass their own).
 */
export function timedProgress(command: string, io: CliIo, what: string, now: () => number = Date.now): (done: number, total: number) => void {
  let last = now();
  return (done, total) => {
    const t = now();
    if (t - last < PROGRESS_EVERY_MS) return;
    last = t;
    io.err(`passline ${command}: ${Math.floor((100 * done) / total)} % of ${what} done\n`);
  };
}
