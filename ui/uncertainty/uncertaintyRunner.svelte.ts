import { untrack } from 'svelte';
import type { Document } from '../../core/model/schema.ts';
import { uncertainInputs } from '../../core/uncertainty/uncertainInputs.ts';
import { runSize } from '../../core/uncertainty/inputDraws.ts';
import { runJob, type JobKind, type JobKinds, type UncertaintyJob, type UncertaintyMessage } from './uncertaintyJob.ts';

/** Figure-only edits keep the inputs' identity (edits share what they do not change): no new run. */
function sameInputs(a: Document, b: Document): boolean {
  return a.pathways === b.pathways && a.species === b.species && a.settings === b.settings && a.comparisons === b.comparisons;
}

export type RunnerStatus = 'no-inputs' | 'waiting' | 'running' | 'done' | 'error';

export interface RunnerOptions<K extends JobKind> {
  /** The kind of job (default: the analysis). */
  kind?: K;
  /** Quiet time after the last new document before a run starts (ms). */
  settleMs?: number;
  /** Samples per slice between progress reports. */
  slice?: number;
  /** The run's N for a document; default: its settings.uncertainty.samples or 10 000. */
  samplesFor?: (doc: Document) => number;
}

/**
 * Keeps a Monte Carlo result for the document: after edits settle (`settleMs` without a new
 * document) it starts a run in a Web Worker, reports progress, and drops runs that a newer
 * document has superseded. Where no worker can be made it runs the same slices on the page.
 * One runner per kind of job; each has its own worker, so an analysis run and a scan run
 * do not wait for each other.
 */
export class UncertaintyRunner<K extends JobKind = 'analysis'> {
  status: RunnerStatus = $state('no-inputs');
  done = $state(0);
  total = $state(0);
  message = $state('');
  result: JobKinds[K]['result'] | null = $state.raw(null);
  /** The document the shown result belongs to. */
  resultDoc: Document | null = $state.raw(null);
  /** The parameters the shown result belongs to. */
  resultParams: JobKinds[K]['params'] | null = $state.raw(null);
  #worker: Worker | null | undefined;
  #timer: ReturnType<typeof setTimeout> | undefined;
  #id = 0;
  #pending = new Map<number, { doc: Document; params: JobKinds[K]['params'] }>();
  readonly #kind: K;
  readonly #settleMs: number;
  readonly #slice: number | undefined;
  readonly #samplesFor: (doc: Document) => number;

  constructor(options: RunnerOptions<K> | number = {}) {
    const o: RunnerOptions<K> = typeof options === 'number' ? { settleMs: options } : options;
    this.#kind = (o.kind ?? 'analysis') as K;
    this.#settleMs = o.settleMs ?? 600;
    this.#slice = o.slice;
    this.#samplesFor = o.samplesFor ?? ((doc) => runSize(doc).total);
  }

  /**
   * Asks for a result for `doc` (and `params`, compared by value); the run starts once no
   * newer request arrives for `settleMs`.
   */
  schedule(doc: Document, ...params: K extends 'analysis' ? [] : [JobKinds[K]['params']]): void {
    const p = ((params as unknown[])[0] ?? null) as JobKinds[K]['params'];
    // Untracked: an effect that schedules must depend on the document only, not on this run's state.
    untrack(() => this.#schedule(doc, p));
  }

  #schedule(doc: Document, params: JobKinds[K]['params']): void {
    clearTimeout(this.#timer);
    const sameParams = JSON.stringify(params) === JSON.stringify(this.resultParams);
    if (this.status === 'done' && this.resultDoc && sameParams && sameInputs(doc, this.resultDoc)) { this.resultDoc = doc; return; }
    if (uncertainInputs(doc).length === 0) {
      this.#cancel();
      this.status = 'no-inputs';
      this.result = null;
      this.resultDoc = null;
      this.resultParams = null;
      return;
    }
    this.status = 'waiting';
    this.#timer = setTimeout(() => this.#start(doc, params), this.#settleMs);
  }

  /** Stops any run and the worker. */
  dispose(): void {
    clearTimeout(this.#timer);
    this.#cancel();
    this.#worker?.terminate();
    this.#worker = null;
  }

  #cancel(): void {
    this.#id++;
    this.#pending.clear();
    this.#worker?.postMessage({ cancel: true });
  }

  #start(doc: Document, params: JobKinds[K]['params']): void {
    const id = ++this.#id;
    const job: UncertaintyJob<K> = { id, kind: this.#kind, doc, samples: this.#samplesFor(doc), seed: runSize(doc).seed, params };
    this.#pending.clear();
    this.#pending.set(id, { doc, params });
    this.status = 'running';
    this.done = 0;
    this.total = job.samples;
    const worker = this.#ensureWorker();
    if (worker) worker.postMessage({ job, slice: this.#slice });
    else void runJob(job, (m) => this.#receive(m), () => this.#id === id, this.#slice);
  }

  #ensureWorker(): Worker | null {
    if (this.#worker !== undefined) return this.#worker;
    try {
      this.#worker = new Worker(new URL('./uncertaintyWorker.ts', import.meta.url), { type: 'module' });
      this.#worker.onmessage = (event: MessageEvent<UncertaintyMessage<K>>) => this.#receive(event.data);
      this.#worker.onerror = () => { this.#worker?.terminate(); this.#worker = null; this.status = 'error'; this.message = 'the background sampler stopped; edit to try again on the page'; };
    } catch {
      this.#worker = null;
    }
    return this.#worker;
  }

  #receive(m: UncertaintyMessage<K>): void {
    if (m.id !== this.#id) return;
    if (m.kind === 'progress') { this.done = m.done; this.total = m.total; return; }
    if (m.kind === 'error') { this.status = 'error'; this.message = m.message; return; }
    const pending = this.#pending.get(m.id);
    this.result = m.result;
    this.resultDoc = pending?.doc ?? null;
    this.resultParams = pending?.params ?? null;
    this.status = 'done';
  }
}
