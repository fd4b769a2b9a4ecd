import type { Document } from '../model/schema.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import { renderFigure as renderPure, type Rasteriser, type RenderOptions } from './renderFigure.ts';
import type { FontSubsetter } from './sceneToPdf.ts';

// Each loaded on first use, so an SVG export loads neither the subsetter's wasm nor resvg.
const subsetFont: FontSubsetter = async (font, text) => (await import('./subsetFont.node.ts')).subsetFontNode(font, text);
const rasterise: Rasteriser = async (svg, widthMm, dpi) => (await import('./png.node.ts')).svgToPng(svg, widthMm, dpi);

/**
 * renderFigure for Node (the CLI): PDF fonts are subset with HarfBuzz (subsetFont.node.ts)
 * and PNG is rasterised by resvg with the bundled font. Same signature as the pure version.
 */
export function renderFigure(profile: ResolvedProfile, doc: Document, options: RenderOptions): Promise<Uint8Array | string> {
  return renderPure(profile, doc, { subsetFont, rasterise, ...options });
}
