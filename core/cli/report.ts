import { extname } from 'node:path';
import { analyseDocument } from '../analysis/analyseDocument.ts';
import { analysisTables } from '../export/analysisTables.ts';
import { renderReport } from '../export/renderReport.node.ts';
import { tablesToCsv, tablesToMarkdown } from '../export/tablesDocument.ts';
import { analysisReport } from '../report/analysisReport.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { loadInput } from './loadInput.ts';
import { applySettingOptions } from './options.ts';
import { readBundledFont } from './fontFile.ts';
import { writeOutput } from './writeOutput.ts';
import { noteLargeWork } from './largeWork.ts';
import { missingGlyphs, missingGlyphsMessage } from '../export/missingGlyphs.ts';
import { readFontMetrics } from '../figure/font/fontMetrics.ts';
import { energyDecimals } from '../format/energyDecimals.ts';
import { annotateReport } from '../uncertainty/annotateReport.ts';
import { monteCarlo } from './monteCarlo.ts';
import { uncertaintyOptions, type UncertaintyCliOptions } from './uncertaintyOptions.ts';

export interface ReportCliOptions extends UncertaintyCliOptions { output?: string | undefined; unit?: string | undefined; temperature?: string | undefined }

function outputOf(options: ReportCliOptions, allowed: readonly string[], command: string): string {
  if (!options.output) throw new CliError(`${command}: -o OUT${allowed[0]} is required`, EXIT_USAGE);
  if (!allowed.includes(extname(options.output).toLowerCase())) throw new CliError(`-o: the output must end in ${allowed.join(' or ')}, got "${options.output}"`, EXIT_USAGE);
  return options.output;
}

/**
 * `passline report FILE -o OUT.pdf [--uncertainty N [--seed S]]`: figure, tables, settings,
 * methods, findings and cautions; with `--uncertainty` (or error bars asked for in the
 * document's figure settings, with its own samples and seed) a Monte Carlo section.
 */
export async function runReport(file: string, options: ReportCliOptions, io: CliIo): Promise<void> {
  const output = outputOf(options, ['.pdf'], 'report');
  const asked = uncertaintyOptions(options);
  const doc = applySettingOptions(loadInput(file, io), options);
  noteLargeWork('report', doc, io);
  const fontBytes = readBundledFont();
  const uncertainty = asked || doc.figure.errorBars ? monteCarlo(doc, asked ?? {}) : undefined;
  await writeOutput(output, await renderReport(doc, { fontBytes, uncertainty }), io);
  const metrics = readFontMetrics(fontBytes);
  const glyphs = missingGlyphsMessage(missingGlyphs(doc, metrics), metrics.family, 'report');
  if (glyphs) io.err(`passline report: warning: ${glyphs}\n`);
}

/** `passline tables FILE -o OUT.csv|OUT.md [--uncertainty N [--seed S]]`: the points and the analysis as tables, with Monte Carlo intervals when asked. */
export async function runTables(file: string, options: ReportCliOptions, io: CliIo): Promise<void> {
  const output = outputOf(options, ['.csv', '.md'], 'tables');
  const asked = uncertaintyOptions(options);
  const doc = applySettingOptions(loadInput(file, io), options);
  const report = analysisReport(doc, analyseDocument(doc));
  const tables = analysisTables(asked ? annotateReport(report, monteCarlo(doc, asked)) : report, energyDecimals(doc.settings, doc.settings.unit));
  await writeOutput(output, extname(output).toLowerCase() === '.md' ? tablesToMarkdown(tables, doc.title) : tablesToCsv(tables), io);
}
