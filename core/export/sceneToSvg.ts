import { drawScene } from '../figure/drawScene.ts';
import type { Scene } from '../figure/scene.ts';
import { escapeXml, num } from './escapeXml.ts';
import { svgSink } from './svgSink.ts';
import { toBase64 } from './toBase64.ts';

/** SVG output choices. */
export interface SvgOptions {
  /** Embed this TTF as an @font-face data URL so the file renders without the font installed. */
  embedFont?: Uint8Array;
}

/**
 * The scene as a standalone SVG document: width and height in mm with a matching
 * viewBox (one user unit = 1 mm), the font family named, text kept as `<text>`, and
 * every user string escaped.
 */
export function sceneToSvg(scene: Scene, options: SvgOptions = {}): string {
  const sink = svgSink();
  drawScene(scene, sink);
  const family = escapeXml(scene.fontFamily);
  const w = num(scene.widthMm);
  const h = num(scene.heightMm);
  const style = options.embedFont
    ? `<defs><style>@font-face{font-family:&apos;${family}&apos;;src:url(data:font/ttf;base64,${toBase64(options.embedFont)}) format(&apos;truetype&apos;);}</style></defs>\n`
    : '';
  return `<?xml version="1.0" encoding="UTF-8"?>\n`
    + `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${w}mm" height="${h}mm" viewBox="0 0 ${w} ${h}" font-family="${family}, sans-serif">\n`
    + style
    + sink.elements.join('\n')
    + '\n</svg>\n';
}
