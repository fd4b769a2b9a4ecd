import { scanDocument } from '../analysis/scanDocument.ts';
import { tableToCsv } from '../export/tableToCsv.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { significant } from './significant.ts';
import { loadInput } from './loadInput.ts';
import { boundedOption } from './options.ts';
import { largeWorkProgress, noteLargeWork } from './largeWork.ts';

export interface ScanCliOptions { from?: string | undefined; to?: string | undefined; count?: string | undefined }

/** `passline scan FILE --from K --to K [--count N]`: k, K, TOF and selectivity vs temperature as CSV. */
export function runScan(file: string, options: ScanCliOptions, io: CliIo): void {
  const doc = loadInput(file, io);
  const from = boundedOption('from', options.from, 'temperatureK', 273.15);
  const to = boundedOption('to', options.to, 'temperatureK', 373.15);
  const count = boundedOption('count', options.count, 'scanCount', 11, true);
  if (count === 1 && options.to !== undefined) throw new CliError('--count 1 scans only --from; give --count 2 or more to reach --to, or leave --to out', EXIT_USAGE);
  noteLargeWork('scan', doc, io);
  const scan = scanDocument(doc, from, to, count, largeWorkProgress('scan', doc, io, 'temperatures'));
  io.out(tableToCsv({
    columns: ['T [K]', ...scan.series.map((s) => `${s.name} [${s.unit}]`)],
    rows: scan.temperaturesK.map((t, k) => [significant(t), ...scan.series.map((s) => (s.values[k] === null ? null : significant(s.values[k]!)))]),
  }));
  for (const a of scan.approximations) io.err(`approximation: ${a}\n`);
}
