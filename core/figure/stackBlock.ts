import type { FigureContext } from './figureContext.ts';
import type { LabelBlock, LabelStyle } from './labelBlock.ts';
import type { PlacedLevel } from './levels.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import type { Box, SceneItem } from './scene.ts';
import { layoutRichText, type RichLine } from './text/layoutRichText.ts';
import { textItem } from './text/textItem.ts';

/** One entry of a stack: the level (and its twins in other pathways) it names. */
export interface StackEntry {
  levels: PlacedLevel[];
  block: LabelBlock;
}

/** A label for close levels at one slot: one line per level, top to bottom as the bars lie. */
export interface StackBlock {
  w: number;
  h: number;
  draw(box: Box): SceneItem[];
}

/** Key sample length and the space after it, in em (our choice). */
const KEY_EM = 1.1;
const KEY_GAP_EM = 0.35;
/** Space between the lines of a stack, in em (our choice; a little air keeps the lines apart). */
const LINE_GAP_EM = 0.08;

/**
 * Lays out a stack: each line is a key (a short bar in the pathway's colour, weight and
 * connector dash, as in the legend), the name, and the energy in the pathway's colour,
 * so a reader pairs every value with its level by order and by key, colour or not.
 */
export function stackBlock(ctx: FigureContext, entries: readonly StackEntry[], style: LabelStyle, paints: ReadonlyMap<number, PathwayPaint>, block: string): StackBlock {
  const space = layoutRichText([{ text: ' ', shift: 'base' }], style.metrics, style.sizeMm).width;
  const key = KEY_EM * style.sizeMm;
  const keyGap = KEY_GAP_EM * style.sizeMm;
  const lines = entries.map((e) => {
    // A state under several names reads "AE / LA + AE" on its one line of the stack.
    const name: RichLine | null = e.block.name && e.block.more?.length ? joinLines([e.block.name, ...e.block.more], space, style) : e.block.name;
    const ascent = Math.max(name?.ascent ?? 0, e.block.energy.ascent);
    const descent = Math.max(name?.descent ?? 0, e.block.energy.descent);
    const w = key + keyGap + (name ? name.width + space : 0) + e.block.energy.width;
    return { entry: e, name, ascent, descent, w };
  });
  const w = Math.max(...lines.map((l) => l.w));
  const lineGap = LINE_GAP_EM * style.sizeMm;
  const h = lines.reduce((s, l) => s + l.ascent + l.descent, 0) + lineGap * (lines.length - 1);
  const owners = entries.flatMap((e) => e.levels.map((l) => ({ pathway: l.point.pathwayId, point: l.point.pointId })));
  return {
    w, h,
    draw(box) {
      const items: SceneItem[] = [];
      let top = box.y;
      for (const l of lines) {
        const level = l.entry.levels[0]!.point;
        const shared = l.entry.levels.length > 1;
        const paint = paints.get(level.pathwayIndex)!;
        const ids = { pathway: level.pathwayId, point: level.pointId, levels: owners, block };
        const baseline = top + l.ascent;
        const y = baseline - 0.3 * style.sizeMm;
        const keyPaint = shared ? { colour: ctx.theme.ink, widthMm: paint.weight * ctx.strokeMm } : { colour: paint.colour, widthMm: paint.weight * ctx.strokeMm };
        items.push({ kind: 'path', role: 'label', ...ids, stroke: { ...keyPaint, cap: 'butt' }, segments: [{ op: 'M', x: box.x, y }, { op: 'L', x: box.x + key, y }] });
        let x = box.x + key + keyGap;
        if (l.name) {
          items.push({ ...textItem(l.name, x, baseline, ctx.theme.ink, 'label'), ...ids });
          x += l.name.width + space;
        }
        items.push({ ...textItem(l.entry.block.energy, x, baseline, shared ? ctx.theme.ink : paint.colour, 'label'), ...ids });
        top += l.ascent + l.descent + lineGap;
      }
      return items;
    },
  };
}

/** Lines set one after another on one baseline, with " / " between them. */
function joinLines(lines: readonly RichLine[], space: number, style: LabelStyle): RichLine {
  const slash = layoutRichText([{ text: '/', shift: 'base' }], style.metrics, style.sizeMm);
  const runs: RichLine['runs'] = [];
  let x = 0;
  lines.forEach((l, i) => {
    if (i > 0) {
      runs.push(...slash.runs.map((r) => ({ ...r, dx: r.dx + x + space })));
      x += slash.width + 2 * space;
    }
    runs.push(...l.runs.map((r) => ({ ...r, dx: r.dx + x })));
    x += l.width;
  });
  return { runs, width: x, ascent: Math.max(...lines.map((l) => l.ascent)), descent: Math.max(...lines.map((l) => l.descent)) };
}
