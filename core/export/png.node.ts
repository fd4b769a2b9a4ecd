import { Resvg } from '@resvg/resvg-js';
import { fileURLToPath } from 'node:url';

/** The bundled font file resvg loads (text in the SVG names its family). */
export const BUNDLED_FONT_FILE = fileURLToPath(new URL('../../assets/fonts/DejaVuSans.ttf', import.meta.url));

/**
 * Rasterises an SVG string with resvg at `dpi` dots per inch (width in px =
 * widthMm / 25.4 × dpi), with only the given font loaded so the output does not depend
 * on the machine's fonts. Node only (resvg is a native module); the renderer never imports it.
 */
export function svgToPng(svg: string, widthMm: number, dpi: number, fontFile = BUNDLED_FONT_FILE): Uint8Array {
  const resvg = new Resvg(svg, {
    font: { fontFiles: [fontFile], loadSystemFonts: false, defaultFontFamily: 'DejaVu Sans' },
    fitTo: { mode: 'width', value: Math.max(1, Math.round((widthMm / 25.4) * dpi)) },
    shapeRendering: 2,
    textRendering: 2,
  });
  return new Uint8Array(resvg.render().asPng());
}
