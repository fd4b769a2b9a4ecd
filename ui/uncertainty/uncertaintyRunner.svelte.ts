import { untrack } from 'svelte';
import type { Document } from '../../core/model/schema.ts';
import { uncertainInputs } from '../../core/uncertainty/uncertainInputs.ts';
import { DEFAULT_SAMPLES, DEFAULT_SEED, type UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import { runJob, type UncertaintyJob, type UncertaintyMessage } from './uncertaintyJob.ts';

/** Figure-only edits keep the inputs' identity (edits share what they do not change): no new run. */
function sameInputs(a: Document, b: Document): boolean {
  return a.pathways === b.pathways && a.species === b.species && a.settings === b.settings && a.comparisons === b.comparisons;
}

export type RunnerStatus = 'no-inputs' | 'waiting' | 'running' | 'done' | 'error';

/**
 * Keeps a Monte Carlo result for the document: after edits settle (`settleMs` without a new
 * document) it starts a run in a Web Worker, reports progress, and drops runs that a newer
 * document has superseded. Where no worker can be made it runs the same slices on the page.
 */
export class UncertaintyRunner {
  status: RunnerStatus = $state('no-inputs');
  done = $state(0);
  total = $state(0);
  message = $state('');
  result: UncertaintyResult | null = $state.raw(null);
  /** The document the shown result belongs to. */
  resultDoc: Document | null = $state.raw(null);
  #worker: Worker | null | undefined;
  #timer: ReturnType<typeof setTimeout> | undefined;
  #id = 0;
  #pending = new Map<number, Document>();
  readonly #settleMs: number;

  constructor(settleMs = 600) {
    this.#settleMs = settleMs;
  }

  /** Asks for a result for `doc`; the run starts once no newer document arrives for `settleMs`. */
  schedule(doc: Document): void {
    // Untracked: an effect that schedules must depend on the document only, not on this run's state.
    untrack(() => this.#schedule(doc));
  }

  #schedule(doc: Document): void {
    clearTimeout(this.#timer);
    if (this.status === 'done' && this.resultDoc && sameInputs(doc, this.resultDoc)) { this.resultDoc = doc; return; }
    if (uncertainInputs(doc).length === 0) {
      this.#cancel();
      this.status = 'no-inputs';
      this.result = null;
      this.resultDoc = null;
      return;
    }
    this.status = 'waiting';
    this.#timer = setTimeout(() => this.#start(doc), this.#settleMs);
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

  #start(doc: Document): void {
    const id = ++this.#id;
    const u = doc.settings.uncertainty;
    const job: UncertaintyJob = { id, doc, samples: u?.samples ?? DEFAULT_SAMPLES, seed: u?.seed ?? DEFAULT_SEED };
    this.#pending.clear();
    this.#pending.set(id, doc);
    this.status = 'running';
    this.done = 0;
    this.total = job.samples;
    const worker = this.#ensureWorker();
    if (worker) worker.postMessage(job);
    else void runJob(job, (m) => this.#receive(m), () => this.#id === id);
  }

  #ensureWorker(): Worker | null {
    if (this.#worker !== undefined) return this.#worker;
    try {
      this.#worker = new Worker(new URL('./uncertaintyWorker.ts', import.meta.url), { type: 'module' });
      this.#worker.onmessage = (event: MessageEvent<UncertaintyMessage>) => this.#receive(event.data);
      this.#worker.onerror = () => { this.#worker?.terminate(); this.#worker = null; this.status = 'error'; this.message = 'the background sampler stopped; edit to try again on the page'; };
    } catch {
      this.#worker = null;
    }
    return this.#worker;
  }

  #receive(m: UncertaintyMessage): void {
    if (m.id !== this.#id) return;
    if (m.kind === 'progress') { this.done = m.done; this.total = m.total; return; }
    if (m.kind === 'error') { this.status = 'error'; this.message = m.message; return; }
    this.result = m.result;
    this.resultDoc = this.#pending.get(m.id) ?? null;
    this.status = 'done';
  }
}
