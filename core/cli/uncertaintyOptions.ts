import { CliError, EXIT_USAGE } from './io.ts';

/** `--uncertainty N [--seed S]` as typed, shared by analyze, tables and report. */
export interface UncertaintyCliOptions {
  /** Number of Monte Carlo samples; absent: no uncertainty run. */
  uncertainty?: string | undefined;
  seed?: string | undefined;
}

function integerOption(name: string, text: string, min: number, max: number): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || value > max) throw new CliError(`--${name}: expected a whole number from ${min} to ${max}, got "${text}"`, EXIT_USAGE);
  return value;
}

/** The samples and seed asked for, or undefined without `--uncertainty`; a usage error names the bad option. */
export function uncertaintyOptions(options: UncertaintyCliOptions): { samples: number; seed: number | undefined } | undefined {
  if (options.seed !== undefined && options.uncertainty === undefined) throw new CliError('--seed needs --uncertainty N', EXIT_USAGE);
  if (options.uncertainty === undefined) return undefined;
  const samples = integerOption('uncertainty', options.uncertainty, 10, 1_000_000);
  const seed = options.seed === undefined ? undefined : integerOption('seed', options.seed, 0, 4_294_967_295);
  return { samples, seed };
}
