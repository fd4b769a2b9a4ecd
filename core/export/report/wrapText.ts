import type { FontMetrics } from '../../figure/font/fontMetrics.ts';
import { measureText } from '../../figure/font/measureText.ts';

/**
 * Breaks text into lines no wider than `width` mm at `sizeMm`: at spaces, and inside a word
 * only when the word alone is too wide. Explicit line breaks are kept.
 */
export function wrapText(text: string, metrics: FontMetrics, sizeMm: number, width: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split('\n')) {
    let line = '';
    for (const word of paragraph.split(' ')) {
      const trial = line ? `${line} ${word}` : word;
      if (measureText(metrics, trial, sizeMm) <= width) {
        line = trial;
        continue;
      }
      if (line) lines.push(line);
      line = '';
      let rest = word;
      while (measureText(metrics, rest, sizeMm) > width && rest.length > 1) {
        let cut = rest.length - 1;
        while (cut > 1 && measureText(metrics, rest.slice(0, cut), sizeMm) > width) cut--;
        lines.push(rest.slice(0, cut));
        rest = rest.slice(cut);
      }
      line = rest;
    }
    lines.push(line);
  }
  return lines;
}
