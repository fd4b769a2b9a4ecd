import { analyseDocument } from '../analysis/analyseDocument.ts';
import { documentStructures } from './documentStructures.ts';
import { CliError, type CliIo } from './io.ts';
import { uncertaintyOptions, type UncertaintyCliOptions } from './uncertaintyOptions.ts';
import { loadInput } from './loadInput.ts';
import { applySettingOptions } from './options.ts';
import { analysisReport } from '../report/analysisReport.ts';
import { analysisText } from '../report/analysisText.ts';
import { documentFindings, findingCounts } from './documentFindings.ts';
import { monteCarlo } from './monteCarlo.ts';
import { annotateReport } from '../uncertainty/annotateReport.ts';
import { uncertaintyText } from '../uncertainty/uncertaintyText.ts';

export interface AnalyzeOptions extends UncertaintyCliOptions {
  json?: boolean | undefined;
  unit?: string | undefined;
  temperature?: string | undefined;
  /** Exit 1 when any finding has severity error. */
  strict?: boolean | undefined;
}

/**
 * `passline analyze FILE`: resolves the profile and prints points, analysis and findings
 * (formulas and charges from the species' structures, where they have any), ending (text
 * form) with a summary line counting the findings by severity; `--uncertainty N` adds Monte
 * Carlo intervals.
 */
export async function runAnalyze(file: string, options: AnalyzeOptions, io: CliIo): Promise<void> {
  const run = uncertaintyOptions(options);
  const doc = applySettingOptions(loadInput(file, io), options);
  const analysis = analyseDocument(doc, await documentStructures(doc));
  const base = analysisReport(doc, analysis);
  const report = { ...base, checks: [...base.checks, ...documentFindings(doc, analysis.profile)] };
  const summary = `findings: ${findingCounts(report.checks)}`;
  if (run === undefined) {
    io.out(options.json ? `${JSON.stringify(report, null, 2)}\n` : `${analysisText(report)}\n${summary}\n`);
  } else {
    const annotated = annotateReport(report, monteCarlo(doc, run));
    io.out(options.json ? `${JSON.stringify(annotated, null, 2)}\n` : `${analysisText(report)}${uncertaintyText(annotated)}\n${summary}\n`);
  }
  const errors = report.checks.filter((f) => f.severity === 'error').length;
  if (options.strict && errors > 0) throw new CliError(`--strict: ${errors} finding${errors === 1 ? '' : 's'} of severity error (${summary})`);
}
