import { axisTitle } from './axisTitle.ts';
import type { EnergyScale } from './energyScale.ts';
import type { FigureContext } from './figureContext.ts';
import { measureText } from './font/measureText.ts';
import type { SceneItem } from './scene.ts';
import { layoutRichText } from './text/layoutRichText.ts';
import { textItem } from './text/textItem.ts';

/** Width the axis needs left of the plot for tick labels, ticks and title, mm. */
export function axisBandWidth(ctx: FigureContext, tickLabels: readonly string[]): number {
  const widest = Math.max(0, ...tickLabels.map((t) => measureText(ctx.metrics, t, ctx.sizeMm)));
  return ctx.lineMm + 2 * ctx.gapMm + widest + tickLength(ctx) + ctx.gapMm;
}

function tickLength(ctx: FigureContext): number {
  return 0.4 * ctx.sizeMm;
}

/** The y axis at `x`: spine over the scale's domain, outward ticks, labels, rotated title. */
export function axisItems(ctx: FigureContext, scale: EnergyScale, x: number, left: number): SceneItem[] {
  const ink = ctx.theme.ink;
  const stroke = { colour: ink, widthMm: 0.7 * ctx.strokeMm, cap: 'butt' as const };
  const [lo, hi] = scale.domain;
  const items: SceneItem[] = [{ kind: 'path', role: 'axis', stroke, segments: [{ op: 'M', x, y: scale.y(hi) }, { op: 'L', x, y: scale.y(lo) }] }];
  const tick = tickLength(ctx);
  const centre = ((ctx.metrics.ascent - ctx.metrics.descent) / 2) * ctx.sizeMm;
  for (const v of scale.ticks) {
    const y = scale.y(v);
    items.push({ kind: 'path', role: 'tick', stroke, segments: [{ op: 'M', x, y }, { op: 'L', x: x - tick, y }] });
    const line = layoutRichText([{ text: scale.format(v), shift: 'base' }], ctx.metrics, ctx.sizeMm);
    items.push(textItem(line, x - tick - ctx.gapMm - line.width, y + centre, ink, 'tick'));
  }
  const title = layoutRichText([{ text: axisTitle(ctx.doc.settings.quantity, ctx.unit), shift: 'base' }], ctx.metrics, ctx.sizeMm);
  const ax = left + title.ascent;
  const ay = (scale.y(lo) + scale.y(hi)) / 2 + title.width / 2;
  items.push({
    kind: 'text', role: 'title', x: ax, y: ay, colour: ink, runs: title.runs, rotateDeg: -90,
    box: { x: ax - title.ascent, y: ay - title.width, w: title.ascent + title.descent, h: title.width },
  });
  return items;
}
