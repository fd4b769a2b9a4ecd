import type { Document } from '../model/schema.ts';
import type { EnergyUnit } from '../units/energy.ts';
import type { FontMetrics } from './font/fontMetrics.ts';
import { MM_PER_PT } from './scene.ts';
import type { Theme } from './themes.ts';

/** Everything the layout pieces share: sizes in mm, theme, font. */
export interface FigureContext {
  doc: Document;
  unit: EnergyUnit;
  metrics: FontMetrics;
  theme: Theme;
  widthMm: number;
  heightMm: number;
  /** Font em size and one line's height, mm. */
  sizeMm: number;
  lineMm: number;
  /** Connector line width; level bars are drawn thicker. */
  strokeMm: number;
  /** Clearance around labels and between bands. */
  gapMm: number;
  autoSubscript: boolean;
}

/** Derives the shared sizes from the document's figure settings. */
export function figureContext(doc: Document, unit: EnergyUnit, metrics: FontMetrics, theme: Theme, size: { widthMm: number; heightMm: number }, autoSubscript: boolean, textScale = 1): FigureContext {
  const sizeMm = doc.figure.fontSizePt * MM_PER_PT * textScale;
  return {
    doc, unit, metrics, theme, ...size, sizeMm, autoSubscript,
    lineMm: (metrics.ascent + metrics.descent) * sizeMm,
    strokeMm: doc.figure.lineWidthPt * MM_PER_PT * textScale,
    gapMm: Math.max(0.3, 0.12 * sizeMm),
  };
}

/** Level bars are this many times the connector width (our choice). */
export const BAR_WEIGHT = 1.6;
