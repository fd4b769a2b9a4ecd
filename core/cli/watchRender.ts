import { watch, type FSWatcher } from 'node:fs';
import { basename, dirname, resolve } from 'node:path';
import { CliError, type CliIo } from './io.ts';
import type { RenderJob } from './renderCommand.ts';

/** Quiet time after the last change before rendering again: editors save in several writes. */
export const DEBOUNCE_MS = 120;

/** An AbortSignal that fires on Ctrl+C (SIGINT) or SIGTERM; `release` removes the handlers. */
function interruptSignal(): { signal: AbortSignal; release: () => void } {
  const controller = new AbortController();
  const stop = () => controller.abort();
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
  return { signal: controller.signal, release: () => { process.off('SIGINT', stop); process.off('SIGTERM', stop); } };
}

/**
 * Renders the jobs, then again each time an input changes, until `stop` fires (by default
 * Ctrl+C). It watches each input's folder rather than the file, because editors often save
 * by writing a new file and renaming it over the old one, which ends a watch on the file.
 * A render in progress finishes before the next starts, and before this returns.
 */
export async function watchRender(
  jobs: readonly RenderJob[],
  render: (jobs: readonly RenderJob[]) => Promise<string[]>,
  io: CliIo,
  stop?: AbortSignal,
): Promise<void> {
  const interrupt = stop ? undefined : interruptSignal();
  const signal = stop ?? interrupt!.signal;
  const watchers: FSWatcher[] = [];
  const pending = new Set<RenderJob>();
  let timer: ReturnType<typeof setTimeout> | undefined;
  let running: Promise<void> = Promise.resolve();
  let busy = false;

  const renderPending = async (): Promise<void> => {
    busy = true;
    while (pending.size > 0) {
      const batch = [...pending];
      pending.clear();
      const failed = await render(batch).catch((error: Error) => {
        io.err(`passline render: ${error.message}\n`);
        return batch.map((job) => job.input);
      });
      const time = new Date().toLocaleTimeString('en-GB');
      for (const job of batch) if (!failed.includes(job.input)) io.err(`passline render: ${time} wrote ${job.output}\n`);
    }
    busy = false;
  };
  const schedule = (changed: readonly RenderJob[]) => {
    for (const job of changed) pending.add(job);
    clearTimeout(timer);
    timer = setTimeout(() => { if (!busy) running = renderPending(); }, DEBOUNCE_MS);
  };

  try {
    await render(jobs);
    const folders = new Map<string, RenderJob[]>();
    for (const job of jobs) {
      const folder = resolve(dirname(job.input));
      folders.set(folder, [...(folders.get(folder) ?? []), job]);
    }
    for (const [folder, inFolder] of folders) {
      try {
        watchers.push(watch(folder, (_event, name) => {
          const changed = name === null ? inFolder : inFolder.filter((job) => basename(job.input) === name);
          if (changed.length > 0 && !signal.aborted) schedule(changed);
        }));
      } catch (error) {
        throw new CliError(`--watch: cannot watch ${folder}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
      }
    }
    io.err(`passline render: watching ${jobs.length === 1 ? jobs[0]!.input : `${jobs.length} inputs`} (Ctrl+C to stop)\n`);
    if (!signal.aborted) await new Promise((done) => signal.addEventListener('abort', done, { once: true }));
  } finally {
    for (const watcher of watchers) watcher.close();
    clearTimeout(timer);
    await running;
    interrupt?.release();
  }
  io.err('passline render: stopped watching\n');
}
