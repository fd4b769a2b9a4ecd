import type { LayoutPathway } from './collectPoints.ts';
import type { FigureContext } from './figureContext.ts';
import { dashMm, type PathwayPaint } from './pathwayPaint.ts';
import type { SceneItem } from './scene.ts';
import { autoSubscript } from './text/autoSubscript.ts';
import { layoutRichText, type RichLine } from './text/layoutRichText.ts';
import { parseMarkup } from './text/parseMarkup.ts';
import { textItem } from './text/textItem.ts';

interface Entry {
  pathway: LayoutPathway;
  paint: PathwayPaint;
  name: RichLine;
  w: number;
}

/** A legend laid out in rows across the top band: its items and the band height. */
export interface Legend {
  items: SceneItem[];
  heightMm: number;
}

/**
 * One entry per visible pathway — a short level bar, a connector stub in the pathway's
 * dash, the name — flowed left to right and wrapped within [x0, x1]. Empty when fewer
 * than two pathways are shown (a single pathway needs no key).
 */
export function legend(ctx: FigureContext, pathways: readonly LayoutPathway[], paints: readonly PathwayPaint[], x0: number, x1: number, top: number): Legend {
  if (pathways.length < 2) return { items: [], heightMm: 0 };
  const sample = 2.5 * ctx.sizeMm;
  const entries: Entry[] = pathways.map((pathway, i) => {
    const spans = parseMarkup(pathway.name);
    const name = layoutRichText(ctx.autoSubscript ? autoSubscript(spans) : spans, ctx.metrics, ctx.sizeMm);
    return { pathway, paint: paints[i]!, name, w: sample + ctx.gapMm * 2 + name.width };
  });
  // Rows as tall as the tallest name (sub- and superscripts reach past the plain line).
  const rowH = Math.max(ctx.lineMm, ...entries.map((e) => e.name.ascent + e.name.descent)) + ctx.gapMm;
  const ascent = Math.max(...entries.map((e) => e.name.ascent));
  const items: SceneItem[] = [];
  let x = x0;
  let row = 0;
  for (const e of entries) {
    if (x > x0 && x + e.w > x1) {
      x = x0;
      row++;
    }
    const baseline = top + row * rowH + ascent;
    const y = baseline - 0.3 * ctx.sizeMm;
    const bar = sample * 0.4;
    const ids = { pathway: e.pathway.id };
    items.push({ kind: 'path', role: 'legend', ...ids, stroke: { colour: e.paint.colour, widthMm: e.paint.weight * ctx.strokeMm, cap: 'butt' }, segments: [{ op: 'M', x, y }, { op: 'L', x: x + bar, y }] });
    const stroke = { colour: e.paint.colour, widthMm: ctx.strokeMm, cap: 'butt' as const, ...dashOf(e.paint, ctx.strokeMm) };
    items.push({ kind: 'path', role: 'legend', ...ids, stroke, segments: [{ op: 'M', x: x + bar, y }, { op: 'L', x: x + sample, y }] });
    items.push(textItem(e.name, x + sample + ctx.gapMm, baseline, ctx.theme.ink, 'legend', ids));
    x += e.w + 3 * ctx.gapMm;
  }
  return { items, heightMm: (row + 1) * rowH + ctx.gapMm };
}

/** `{ dashMm }` for a dashed paint, nothing for solid (keeps exactOptionalPropertyTypes-friendly objects). */
export function dashOf(paint: PathwayPaint, widthMm: number): { dashMm?: number[] } {
  const dash = dashMm(paint.dash, widthMm);
  return dash ? { dashMm: dash } : {};
}
