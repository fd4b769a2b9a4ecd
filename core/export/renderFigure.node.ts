import type { Document } from '../model/schema.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import { svgToPng } from './png.node.ts';
import { renderFigure as renderPure, type RenderOptions } from './renderFigure.ts';
import { subsetFontNode } from './subsetFont.node.ts';

/**
 * renderFigure for Node (the CLI): PDF fonts are subset with HarfBuzz (subsetFont.node.ts) and PNG is
 * rasterised by resvg with the bundled font. Same signature as the pure version.
 */
export function renderFigure(profile: ResolvedProfile, doc: Document, options: RenderOptions): Promise<Uint8Array | string> {
  return renderPure(profile, doc, { subsetFont: subsetFontNode, rasterise: svgToPng, ...options });
}
