import { scanDocument } from '../analysis/scanDocument.ts';
import { tableToCsv } from '../export/tableToCsv.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { significant } from './significant.ts';
import { loadInput } from './loadInput.ts';
import { positiveOption } from './options.ts';

export interface ScanCliOptions { from?: string | undefined; to?: string | undefined; count?: string | undefined }

/** `passline scan FILE --from K --to K [--count N]`: k, K, TOF and selectivity vs temperature as CSV. */
export function runScan(file: string, options: ScanCliOptions, io: CliIo): void {
  const doc = loadInput(file, io);
  const from = positiveOption('from', options.from, 273.15);
  const to = positiveOption('to', options.to, 373.15);
  const count = positiveOption('count', options.count, 11);
  if (!Number.isInteger(count) || count > 1000) throw new CliError(`--count: expected a whole number from 1 to 1000, got "${options.count}"`, EXIT_USAGE);
  const scan = scanDocument(doc, from, to, count);
  io.out(tableToCsv({
    columns: ['T [K]', ...scan.series.map((s) => `${s.name} [${s.unit}]`)],
    rows: scan.temperaturesK.map((t, k) => [significant(t), ...scan.series.map((s) => (s.values[k] === null ? null : significant(s.values[k]!)))]),
  }));
  for (const a of scan.approximations) io.err(`approximation: ${a}\n`);
}
