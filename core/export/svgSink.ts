import type { Stroke, TextItem } from '../figure/scene.ts';
import type { DrawingSink } from '../figure/sink.ts';
import { escapeXml, num } from './escapeXml.ts';
import { safeText } from '../format/safeText.ts';

/** A sink that collects SVG elements; `elements` holds them in drawing order. */
export interface SvgSink extends DrawingSink {
  elements: string[];
}

/** Makes an SVG-writing sink: each painted path becomes one `<path>`, each text item one `<text>`. */
export function svgSink(): SvgSink {
  const elements: string[] = [];
  let d = '';
  return {
    elements,
    moveTo: (x, y) => { d += 'M' + num(x) + ' ' + num(y); },
    lineTo: (x, y) => { d += 'L' + num(x) + ' ' + num(y); },
    curveTo: (x1, y1, x2, y2, x, y) => { d += 'C' + num(x1) + ' ' + num(y1) + ' ' + num(x2) + ' ' + num(y2) + ' ' + num(x) + ' ' + num(y); },
    closePath: () => { d += 'Z'; },
    paint(stroke, fill) {
      elements.push('<path d="' + d + '" ' + paintAttributes(stroke, fill) + '/>');
      d = '';
    },
    text(item) {
      elements.push(textElement(item));
    },
    group(name, ids) {
      elements.push(name === null ? '</g>' : '<g id="' + escapeXml(svgId(name)) + '" class="structure"'
        + (ids.pathway ? ' data-pathway="' + escapeXml(ids.pathway) + '"' : '') + (ids.point ? ' data-point="' + escapeXml(ids.point) + '"' : '') + '>');
    },
  };
}

function paintAttributes(stroke: Stroke | undefined, fill: string | undefined): string {
  let out = 'fill="' + (fill ? escapeXml(fill) : 'none') + '"';
  if (stroke) {
    out += ' stroke="' + escapeXml(stroke.colour) + '" stroke-width="' + num(stroke.widthMm) + '" stroke-linecap="' + (stroke.cap ?? 'butt') + '"';
    if (stroke.dashMm) out += ' stroke-dasharray="' + stroke.dashMm.map(num).join(' ') + '"';
  }
  return out;
}

function textElement(item: TextItem): string {
  let out = '<text xml:space="preserve" fill="' + escapeXml(item.colour) + '"';
  if (item.rotateDeg) out += ' transform="rotate(' + num(item.rotateDeg) + ' ' + num(item.x) + ' ' + num(item.y) + ')"';
  out += '>';
  for (const r of item.runs) {
    out += '<tspan x="' + num(item.x + r.dx) + '" y="' + num(item.y + r.dy) + '" font-size="' + num(r.sizeMm) + '">' + escapeXml(safeText(r.text)) + '</tspan>';
  }
  return out + '</text>';
}

/** A group name as an XML id: letters, digits, '-', '_' and '.', other characters as '_'. */
function svgId(name: string): string {
  return name.replace(/[^A-Za-z0-9_.-]+/g, '-');
}
