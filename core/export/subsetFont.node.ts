import subset from 'subset-font';
import type { FontSubsetter } from './sceneToPdf.ts';

/**
 * Subsets a TrueType font with subset-font (HarfBuzz compiled to WebAssembly), keeping
 * TrueType outlines and the cmap. Node only (the library reads its wasm with node:fs).
 */
export const subsetFontNode: FontSubsetter = async (font, text) =>
  new Uint8Array(await subset(Buffer.from(font), text, { targetFormat: 'truetype' }));
