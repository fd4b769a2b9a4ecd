import fontUrl from '../../assets/fonts/DejaVuSans.ttf?url';
import { readFontMetrics, type FontMetrics } from '../../core/figure/font/fontMetrics.ts';

/**
 * The figure font (DejaVu Sans, the one PDF export embeds), loaded once: the canvas lays
 * text out with its metrics so the screen and every export agree.
 */
export class FigureFont {
  bytes: Uint8Array | null = $state.raw(null);
  metrics: FontMetrics | null = $state.raw(null);
  error = $state('');

  /** Fetches the bundled font; on failure `error` says why and the canvas shows it. */
  async load(fetcher: typeof fetch = fetch): Promise<void> {
    try {
      const response = await fetcher(fontUrl);
      if (!response.ok) throw new Error(`HTTP ${response.status}`);
      const bytes = new Uint8Array(await response.arrayBuffer());
      this.metrics = readFontMetrics(bytes);
      this.bytes = bytes;
    } catch (error) {
      this.error = `The figure font could not be loaded (${(error as Error).message}); the figure cannot be drawn.`;
    }
  }
}
