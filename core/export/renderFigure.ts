import { readFontMetrics, type FontMetrics } from '../figure/font/fontMetrics.ts';
import type { ErrorBarRanges } from '../figure/errorBars.ts';
import { layoutFigure } from '../figure/layoutFigure.ts';
import type { Preset } from '../figure/presets.ts';
import type { ThemeName } from '../figure/themes.ts';
import { outsideHard } from '../model/bounds.ts';
import type { Document } from '../model/schema.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import type { Scene } from '../figure/scene.ts';
import type { PointDrawing } from '../structure/pointDepictions.ts';
import type { FontSubsetter } from './sceneToPdf.ts';
import { sceneToSvg } from './sceneToSvg.ts';

export type FigureFormat = 'svg' | 'pdf' | 'png';

/** Rasterises SVG text to PNG bytes (resvg in Node; see renderFigure.node.ts). */
export type Rasteriser = (svg: string, widthMm: number, dpi: number) => Uint8Array | Promise<Uint8Array>;

/** What to render; anything left out comes from the document's figure settings. */
export interface RenderOptions {
  format: FigureFormat;
  /** The TrueType font to measure with and embed (DejaVu Sans from assets/fonts). */
  fontBytes: Uint8Array;
  widthMm?: number;
  heightMm?: number;
  preset?: Preset;
  theme?: ThemeName;
  /** PNG resolution, dots per inch (default 300). */
  dpi?: number;
  autoSubscript?: boolean;
  /** Embed the font in SVG output as a data URL. */
  embedFontInSvg?: boolean;
  subsetFont?: FontSubsetter;
  rasterise?: Rasteriser;
  /** Molecule drawings by point (pointDepictions), drawn as vectors beside the levels. */
  structures?: ReadonlyMap<string, PointDrawing>;
  /** Error bars on the levels (core/figure/errorBars.ts), e.g. from core/uncertainty's errorBarRanges. */
  errorBars?: ErrorBarRanges;
  /** The metrics of `fontBytes`, when the caller has already read them (spares a second parse). */
  metrics?: FontMetrics;
  /** Called with the laid-out scene before it is written (e.g. to report omitted labels). */
  onScene?: (scene: Scene) => void;
}

/** Largest and smallest accepted values (our limits: beyond them files get silly). */
/** A message naming the bad option, or null when the options can be rendered (limits: core/model/bounds.ts). */
export function checkRenderOptions(options: Pick<RenderOptions, 'dpi' | 'widthMm' | 'heightMm'>): string | null {
  const { dpi, widthMm, heightMm } = options;
  const badDpi = dpi === undefined ? null : outsideHard('dpi', dpi);
  if (badDpi) return `dpi: ${badDpi}`;
  for (const [name, v] of [['width', widthMm], ['height', heightMm]] as const) {
    const bad = v === undefined ? null : outsideHard('figureMm', v);
    if (bad) return `${name}: ${bad}`;
  }
  return null;
}

/**
 * Lays the profile out and writes it as SVG (a string), PDF or PNG (bytes). PNG needs a
 * `rasterise` function; options must pass checkRenderOptions (otherwise this throws).
 */
export async function renderFigure(profile: ResolvedProfile, doc: Document, options: RenderOptions): Promise<Uint8Array | string> {
  const problem = checkRenderOptions(options);
  if (problem) throw new RangeError(`renderFigure: ${problem}`);
  const metrics = options.metrics ?? readFontMetrics(options.fontBytes);
  const scene = layoutFigure(profile, doc, {
    metrics,
    ...(options.preset ? { preset: options.preset } : {}),
    ...(options.theme ? { theme: options.theme } : {}),
    ...(options.widthMm !== undefined ? { widthMm: options.widthMm } : {}),
    ...(options.heightMm !== undefined ? { heightMm: options.heightMm } : {}),
    ...(options.autoSubscript !== undefined ? { autoSubscript: options.autoSubscript } : {}),
    ...(options.structures ? { structures: options.structures } : {}),
    ...(options.errorBars ? { errorBars: options.errorBars } : {}),
  });
  options.onScene?.(scene);
  if (options.format === 'pdf') {
    // Loaded on demand: jsPDF is most of the code an SVG or PNG export would otherwise load.
    const { sceneToPdf } = await import('./sceneToPdf.ts');
    return sceneToPdf(scene, { fontBytes: options.fontBytes, ...(options.subsetFont ? { subsetFont: options.subsetFont } : {}), title: doc.title || 'Energy profile' });
  }
  const svg = sceneToSvg(scene, options.embedFontInSvg && options.format === 'svg' ? { embedFont: options.fontBytes } : {});
  if (options.format === 'svg') return svg;
  if (!options.rasterise) throw new Error('renderFigure: PNG output needs a rasteriser (use renderFigure from renderFigure.node.ts)');
  return options.rasterise(svg, scene.widthMm, options.dpi ?? 300);
}
