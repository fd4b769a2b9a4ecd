import { drawItems } from '../figure/drawScene.ts';
import type { Scene } from '../figure/scene.ts';
import { sceneLayers } from '../figure/sceneLayers.ts';
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
 * every user string escaped. The drawing is grouped for a vector editor: one `<g>` per
 * layer (axis, connectors, levels, annotations, labels, legend; ids as named), inside it
 * one `<g>` per pathway (id "labels-PATHWAY", class "pathway-PATHWAY", so all of a
 * pathway's groups share a class); items of no pathway sit in the layer itself.
 */
export function sceneToSvg(scene: Scene, options: SvgOptions = {}): string {
  const sink = svgSink();
  if (scene.background) {
    sink.elements.push(`<rect id="background" x="0" y="0" width="${num(scene.widthMm)}" height="${num(scene.heightMm)}" fill="${escapeXml(scene.background)}"/>`);
  }
  const ids = new Set<string>(['background']);
  const unique = (base: string) => {
    let id = base;
    for (let k = 2; ids.has(id); k++) id = `${base}-${k}`;
    ids.add(id);
    return id;
  };
  for (const layer of sceneLayers(scene.items)) {
    sink.elements.push(`<g id="${unique(xmlName(layer.id))}">`);
    for (const group of layer.groups) {
      if (group.pathway !== null) {
        const name = xmlName(group.pathway);
        sink.elements.push(`<g id="${unique(`${xmlName(layer.id)}-${name}`)}" class="pathway-${name}">`);
      }
      drawItems(group.items, sink);
      if (group.pathway !== null) sink.elements.push('</g>');
    }
    sink.elements.push('</g>');
  }
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

/** An id-safe form of a name (XML NCName characters only; others become "_"). */
function xmlName(text: string): string {
  const safe = text.replace(/[^A-Za-z0-9._-]/g, '_');
  return /^[A-Za-z_]/.test(safe) ? safe : `_${safe}`;
}
