import type { FontMetrics } from './fontMetrics.ts';

/** Width in mm of plain text set at `sizeMm` (the em size), without kerning. */
export function measureText(metrics: FontMetrics, text: string, sizeMm: number): number {
  let em = 0;
  for (const ch of text) em += metrics.advance(ch.codePointAt(0)!);
  return em * sizeMm;
}
