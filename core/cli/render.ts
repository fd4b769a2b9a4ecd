import { extname } from 'node:path';
import { resolveProfile } from '../profile/resolve.ts';
import { pointDepictions } from '../structure/pointDepictions.ts';
import { withStructureFormulas } from '../structure/withStructureFormulas.ts';
import { documentStructures } from './documentStructures.ts';
import { renderFigure } from '../export/renderFigure.node.ts';
import { checkRenderOptions, type FigureFormat } from '../export/renderFigure.ts';
import { readFontMetrics } from '../figure/font/fontMetrics.ts';
import type { Scene } from '../figure/scene.ts';
import { omittedLabelsMessage } from '../figure/omittedLabelsMessage.ts';
import type { Preset } from '../figure/presets.ts';
import type { Document } from '../model/schema.ts';
import type { ThemeName } from '../figure/themes.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { loadInput } from './loadInput.ts';
import { applySettingOptions, boundedOption } from './options.ts';
import { readBundledFont } from './fontFile.ts';
import { writeOutput } from './writeOutput.ts';
import { documentFindings } from './documentFindings.ts';
import { largeWorkStages, noteLargeWork } from './largeWork.ts';
import { missingGlyphs, missingGlyphsMessage } from '../export/missingGlyphs.ts';

export interface RenderCliOptions {
  output?: string | undefined;
  widthMm?: string | undefined;
  preset?: string | undefined;
  theme?: string | undefined;
  dpi?: string | undefined;
  unit?: string | undefined;
  temperature?: string | undefined;
  /** Refuse to write when the profile has findings of severity error. */
  strict?: boolean | undefined;
}

const PRESETS: readonly Preset[] = ['single', 'double', 'slide'];
const THEMES: readonly ThemeName[] = ['colour', 'greyscale', 'dark'];
const FORMATS: Record<string, FigureFormat> = { '.svg': 'svg', '.pdf': 'pdf', '.png': 'png' };

function pick<T extends string>(name: string, value: string | undefined, allowed: readonly T[]): T | undefined {
  if (value === undefined) return undefined;
  if (!(allowed as readonly string[]).includes(value)) throw new CliError(`--${name}: expected one of ${allowed.join(', ')}, got "${value}"`, EXIT_USAGE);
  return value as T;
}

/**
 * `passline render FILE -o OUT.svg|pdf|png`: the figure, drawn from the same scene as the
 * app, molecule drawings included. Labels and drawings left out for want of room are named
 * in a warning on stderr (exit code 0).
 */
export async function runRender(file: string, options: RenderCliOptions, io: CliIo): Promise<void> {
  if (!options.output) throw new CliError('render: -o OUT.svg, OUT.pdf or OUT.png is required', EXIT_USAGE);
  const format = FORMATS[extname(options.output).toLowerCase()];
  if (!format) throw new CliError(`-o: the output must end in .svg, .pdf or .png, got "${options.output}"`, EXIT_USAGE);
  const preset = pick('preset', options.preset, PRESETS);
  const theme = pick('theme', options.theme, THEMES);
  const widthMm = options.widthMm === undefined ? undefined : boundedOption('width-mm', options.widthMm, 'figureMm', 0);
  const dpi = options.dpi === undefined ? undefined : boundedOption('dpi', options.dpi, 'dpi', 0);
  const problem = checkRenderOptions({ dpi, widthMm });
  if (problem) throw new CliError(`--${problem.replace(/^width/, 'width-mm')}`, EXIT_USAGE);
  const doc = applySettingOptions(loadInput(file, io), options);
  noteLargeWork('render', doc, io);
  const stage = largeWorkStages('render', doc, io);
  stage('resolving the profile');
  const structures = await documentStructures(doc);
  const profile = resolveProfile(structures ? withStructureFormulas(doc, structures) : doc);
  const findings = documentFindings(doc, profile);
  const blank = findings.find((f) => f.code === 'no-points');
  if (blank) throw new CliError(`${file}: ${blank.message}; nothing was written`);
  const errors = [...profile.findings, ...findings].filter((f) => f.severity === 'error');
  if (options.strict && errors.length > 0) {
    throw new CliError(`--strict: ${errors.length} finding${errors.length === 1 ? '' : 's'} of severity error, first: ${errors[0]!.message}; nothing was written (see passline analyze)`);
  }
  const fontBytes = readBundledFont();
  const metrics = readFontMetrics(fontBytes);
  const layout = { ...(preset ? { preset } : {}), ...(theme ? { theme } : {}), ...(widthMm !== undefined ? { widthMm } : {}), ...(structures ? { structures: pointDepictions(doc, structures) } : {}) };
  // Error bars set in the document's figure settings come from a Monte Carlo run (its samples and seed).
  const bars = doc.figure.errorBars;
  if (bars) stage('sampling the error bars');
  const errorBars = bars ? await monteCarloErrorBars(doc, bars) : undefined;
  let omitted: Scene['omittedLabels'] = [];
  stage('laying out the figure');
  const onScene = (scene: Scene) => { omitted = scene.omittedLabels; stage(`writing the ${format.toUpperCase()}`); };
  const data = await renderFigure(profile, doc, { format, fontBytes, metrics, onScene, ...layout, ...(dpi !== undefined ? { dpi } : {}), ...(errorBars ? { errorBars } : {}) });
  await writeOutput(options.output, data, io);
  stage('done');
  const warning = omittedLabelsMessage(omitted);
  if (warning) io.err(`passline render: warning: ${warning}\n`);
  for (const f of findings) io.err(`passline render: ${f.severity}: ${f.message}\n`);
  const glyphs = format === 'svg' ? null : missingGlyphsMessage(missingGlyphs(doc, metrics), metrics.family, format.toUpperCase());
  if (glyphs) io.err(`passline render: warning: ${glyphs}\n`);
}

/** The error bars of the document's Monte Carlo run; its modules load only when bars are asked for. */
async function monteCarloErrorBars(doc: Document, bars: NonNullable<Document['figure']['errorBars']>) {
  const [{ monteCarlo }, { errorBarRanges }] = await Promise.all([import('./monteCarlo.ts'), import('../uncertainty/errorBarRanges.ts')]);
  return errorBarRanges(monteCarlo(doc), bars);
}
