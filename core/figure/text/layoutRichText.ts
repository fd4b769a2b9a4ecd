import type { FontMetrics } from '../font/fontMetrics.ts';
import { measureText } from '../font/measureText.ts';
import type { TextRun } from '../scene.ts';
import type { Span } from './parseMarkup.ts';

/** Runs of one line of text, measured. y offsets are from the baseline, positive down. */
export interface RichLine {
  runs: TextRun[];
  width: number;
  /** Extent above and below the baseline, in mm. */
  ascent: number;
  descent: number;
}

// Script size and shifts as fractions of the base size: our choice, close to the
// usual typographic 65–70 % size with a third of an em raise (common practice).
const SCRIPT_SCALE = 0.7;
const SUB_DROP = 0.2;
const SUP_RISE = 0.38;

/** Sets spans on one line at `sizeMm`, measuring with the font's own advances. */
export function layoutRichText(spans: readonly Span[], metrics: FontMetrics, sizeMm: number): RichLine {
  const runs: TextRun[] = [];
  let x = 0;
  let ascent = metrics.ascent * sizeMm;
  let descent = metrics.descent * sizeMm;
  for (const span of spans) {
    const size = span.shift === 'base' ? sizeMm : sizeMm * SCRIPT_SCALE;
    const dy = span.shift === 'sub' ? SUB_DROP * sizeMm : span.shift === 'sup' ? -SUP_RISE * sizeMm : 0;
    runs.push({ text: span.text, dx: x, dy, sizeMm: size });
    x += measureText(metrics, span.text, size);
    ascent = Math.max(ascent, metrics.ascent * size - dy);
    descent = Math.max(descent, metrics.descent * size + dy);
  }
  return { runs, width: x, ascent, descent };
}
