import { mkdir } from 'node:fs/promises';
import { basename, extname, join } from 'node:path';
import { CliError, EXIT_INPUT, EXIT_USAGE, type CliIo } from './io.ts';
import { runRender, type RenderCliOptions } from './render.ts';
import { watchRender } from './watchRender.ts';

/** How `passline render` is driven: one file to `-o`, many to `--out-dir`, once or `--watch`. */
export interface RenderModeOptions {
  outDir?: string | undefined;
  format?: string | undefined;
  watch?: boolean | undefined;
}

/** One input and the file it is drawn to. */
export interface RenderJob { input: string; output: string }

const FORMATS = ['svg', 'pdf', 'png'] as const;

/** The jobs the arguments ask for; a usage error names the clash. */
export function renderJobs(files: readonly string[], mode: RenderModeOptions, output: string | undefined): RenderJob[] {
  if (mode.outDir === undefined) {
    if (mode.format !== undefined) throw new CliError('--format goes with --out-dir; with -o the extension of OUT picks the format', EXIT_USAGE);
    if (files.length > 1) throw new CliError(`-o names one output but ${files.length} inputs were given; for several use --out-dir DIR --format svg|pdf|png`, EXIT_USAGE);
    return [{ input: files[0]!, output: output ?? '' }];
  }
  if (output !== undefined) throw new CliError('-o and --out-dir exclude each other: -o for one file, --out-dir for many', EXIT_USAGE);
  const format = mode.format?.toLowerCase();
  if (format === undefined) throw new CliError('--out-dir needs --format svg, pdf or png', EXIT_USAGE);
  if (!(FORMATS as readonly string[]).includes(format)) throw new CliError(`--format: expected one of ${FORMATS.join(', ')}, got "${mode.format}"`, EXIT_USAGE);
  const jobs = files.map((input) => ({ input, output: join(mode.outDir!, `${basename(input, extname(input))}.${format}`) }));
  const seen = new Map<string, string>();
  for (const { input, output: out } of jobs) {
    const other = seen.get(out);
    if (other !== undefined) throw new CliError(`--out-dir: ${other} and ${input} would both be written to ${out}; rename one`, EXIT_USAGE);
    seen.set(out, input);
  }
  return jobs;
}

/**
 * Renders every job in this process, carrying on past a bad input (reported on stderr with
 * its message) and returning the inputs that failed. A usage error (a bad option, the same
 * for every input) stops at once.
 */
export async function renderEach(jobs: readonly RenderJob[], options: RenderCliOptions, io: CliIo): Promise<string[]> {
  const failed: string[] = [];
  for (const job of jobs) {
    try {
      await runRender(job.input, { ...options, output: job.output }, io);
    } catch (error) {
      if (error instanceof CliError && error.exitCode === EXIT_USAGE) throw error;
      const message = error instanceof CliError ? error.message : `internal error: ${(error as Error).message}`;
      io.err(`passline render: ${message}\n`);
      failed.push(job.input);
    }
  }
  return failed;
}

/** `passline render FILE... [-o OUT | --out-dir DIR --format F] [--watch]`. */
export async function runRenderCommand(files: readonly string[], mode: RenderModeOptions, options: RenderCliOptions, io: CliIo): Promise<void> {
  const jobs = renderJobs(files, mode, options.output);
  if (mode.outDir !== undefined) {
    try {
      await mkdir(mode.outDir, { recursive: true });
    } catch (error) {
      throw new CliError(`--out-dir: cannot create ${mode.outDir}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
    }
  }
  if (mode.watch) {
    await watchRender(jobs, (batch) => renderEach(batch, options, io), io);
    return;
  }
  if (mode.outDir === undefined) {
    await runRender(jobs[0]!.input, options, io);
    return;
  }
  const failed = await renderEach(jobs, options, io);
  if (failed.length > 0) throw new CliError(`${failed.length} of ${jobs.length} inputs failed: ${failed.join(', ')}`, EXIT_INPUT);
}
