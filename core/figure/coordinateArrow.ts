import type { FigureContext } from './figureContext.ts';
import type { SceneItem } from './scene.ts';
import { layoutRichText } from './text/layoutRichText.ts';
import { textItem } from './text/textItem.ts';

/** Words under the horizontal arrow (the trade's term). */
export const COORDINATE_TEXT = 'Reaction coordinate';

/** Height of the band the arrow and its words need below the plot, mm. */
export function arrowBandHeight(ctx: FigureContext): number {
  return 3 * ctx.gapMm + ctx.lineMm + headSize(ctx);
}

function headSize(ctx: FigureContext): number {
  return Math.max(1.2, 4 * ctx.strokeMm);
}

/** A left-to-right arrow from x0 to x1 at the top of the band, words centred under it. */
export function coordinateArrow(ctx: FigureContext, x0: number, x1: number, top: number): SceneItem[] {
  const head = headSize(ctx);
  const y = top + ctx.gapMm + head / 2;
  const ink = ctx.theme.ink;
  const words = layoutRichText([{ text: COORDINATE_TEXT, shift: 'base' }], ctx.metrics, ctx.sizeMm);
  return [
    { kind: 'path', role: 'arrow', stroke: { colour: ink, widthMm: 0.7 * ctx.strokeMm, cap: 'butt' }, segments: [{ op: 'M', x: x0, y }, { op: 'L', x: x1 - head / 2, y }] },
    { kind: 'path', role: 'arrow', fill: ink, segments: [
      { op: 'M', x: x1, y }, { op: 'L', x: x1 - head, y: y - head * 0.4 }, { op: 'L', x: x1 - head, y: y + head * 0.4 }, { op: 'Z' },
    ] },
    textItem(words, (x0 + x1 - words.width) / 2, y + head / 2 + ctx.gapMm + words.ascent, ink, 'title'),
  ];
}
