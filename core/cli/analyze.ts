import { analyseDocument } from '../analysis/analyseDocument.ts';
import { documentStructures } from './documentStructures.ts';
import type { CliIo } from './io.ts';
import { loadInput } from './loadInput.ts';
import { applySettingOptions } from './options.ts';
import { analysisReport } from '../report/analysisReport.ts';
import { analysisText } from '../report/analysisText.ts';

export interface AnalyzeOptions {
  json?: boolean | undefined;
  unit?: string | undefined;
  temperature?: string | undefined;
}

/**
 * `passline analyze FILE`: resolves the profile and prints points, analysis and findings
 * (formulas and charges from the species' structures, where they have any).
 */
export async function runAnalyze(file: string, options: AnalyzeOptions, io: CliIo): Promise<void> {
  const doc = applySettingOptions(loadInput(file, io), options);
  const report = analysisReport(doc, analyseDocument(doc, await documentStructures(doc)));
  io.out(options.json ? `${JSON.stringify(report, null, 2)}\n` : analysisText(report));
}
