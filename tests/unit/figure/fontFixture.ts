import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readFontMetrics, type FontMetrics } from '../../../core/figure/font/fontMetrics.ts';

/** Path of the bundled DejaVu Sans file. */
export const FONT_PATH = fileURLToPath(new URL('../../../assets/fonts/DejaVuSans.ttf', import.meta.url));

/** The bundled font's bytes, read once. */
export const fontBytes: Uint8Array = new Uint8Array(readFileSync(FONT_PATH));

let cached: FontMetrics | undefined;
/** Metrics of the bundled font, read once per test file. */
export function fontMetrics(): FontMetrics {
  cached ??= readFontMetrics(fontBytes);
  return cached;
}
