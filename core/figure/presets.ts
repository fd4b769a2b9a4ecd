import type { Figure } from '../model/schema.ts';

/** Named figure sizes. */
export type Preset = Figure['preset'];

/**
 * Sizes in mm (common practice, our rounding): journal single-column figures are about
 * 82–90 mm wide and two-column ones 170–180 mm, so we use 85 and 175 mm; a 16:9 slide
 * is 10 × 5.625 in = 254 × 142.875 mm. Heights are our choice of aspect.
 */
export const PRESETS: Readonly<Record<Preset, { widthMm: number; aspect: number; textScale: number }>> = {
  single: { widthMm: 85, aspect: 0.7, textScale: 1 },
  double: { widthMm: 175, aspect: 0.55, textScale: 1 },
  // A slide is seen from across a room: text and lines at twice the print size (our choice).
  slide: { widthMm: 254, aspect: 9 / 16, textScale: 2 },
};

/** Figure width and height: explicit values win, otherwise the preset's. */
export function figureSize(preset: Preset, widthMm?: number, heightMm?: number): { widthMm: number; heightMm: number } {
  const p = PRESETS[preset];
  const width = widthMm ?? p.widthMm;
  return { widthMm: width, heightMm: heightMm ?? width * p.aspect };
}
