import type { FigureContext } from './figureContext.ts';
import { blockItems, labelBlock, type LabelBlock, type LabelStyle } from './labelBlock.ts';
import { barBox, type PlacedLevel } from './levels.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import { placeLabels, type LabelRequest } from './placeLabels.ts';
import { overlaps } from './geometry.ts';
import { pathPieces } from './pathPieces.ts';
import type { Box, PathItem, SceneItem } from './scene.ts';

interface Group {
  level: PlacedLevel;
  block: LabelBlock;
  shared: boolean;
}

/**
 * Labels for all levels: one per level, except that levels at the same spot with the same
 * name and printed energy (a state shared by several pathways) get one label in ink.
 * Placed in slot order, then pathway order, away from every bar and each other, and
 * off the connectors where a spot near the bar allows.
 * Returns the items and the label boxes (for tests and hit-testing).
 */
export function labels(ctx: FigureContext, placed: readonly PlacedLevel[], paints: ReadonlyMap<number, PathwayPaint>, bounds: Box, soft: readonly Box[]): { items: SceneItem[]; boxes: Box[] } {
  const style: LabelStyle = {
    metrics: ctx.metrics, sizeMm: ctx.sizeMm, decimals: ctx.doc.settings.decimals,
    energyFormat: ctx.doc.figure.energyFormat, unit: ctx.unit, daggerOnTs: ctx.doc.figure.daggerOnTs, autoSubscript: ctx.autoSubscript,
  };
  const order = [...placed].sort((a, b) => a.x - b.x || a.point.pathwayIndex - b.point.pathwayIndex || a.y - b.y);
  const groups: Group[] = [];
  for (const level of order) {
    const block = labelBlock(level.point.label, level.point.kind, level.point.energy!, style);
    const twin = groups.find((g) => Math.abs(g.level.x - level.x) < 1e-6 && Math.abs(g.level.y - level.y) < 0.5 * ctx.strokeMm
      && g.level.point.label === level.point.label && g.block.energyText === block.energyText);
    if (twin) twin.shared = true;
    else groups.push({ level, block, shared: false });
  }
  const requests: LabelRequest[] = groups.map(({ level, block }) => ({
    x: level.x, y: level.y, halfWidth: level.halfWidth, w: block.w, h: block.h,
    prefer: level.point.kind === 'ts' ? 'above' : 'below',
    ...(level.point.labelOffsetMm ? { fixed: level.point.labelOffsetMm } : {}),
  }));
  const placements = placeLabels(requests, { hard: placed.map((l) => barBox(l, ctx)), soft }, bounds, ctx.gapMm);
  const items: SceneItem[] = [];
  const boxes = placements.map((p) => p.box);
  groups.forEach((g, i) => {
    const { box, displaced } = placements[i]!;
    const colour = g.shared ? ctx.theme.ink : paints.get(g.level.point.pathwayIndex)!.colour;
    const line = displaced ? leader(ctx, g.level, box) : null;
    // A leader that would cut through another label confuses more than it helps.
    if (line && !crossesOthers(line, boxes, i)) items.push(line);
    items.push(...blockItems(g.block, box, ctx.theme.ink, colour, { pathway: g.level.point.pathwayId, point: g.level.point.pointId }));
  });
  return { items, boxes };
}

function crossesOthers(line: PathItem, boxes: readonly Box[], own: number): boolean {
  const pieces = pathPieces(line.segments, 0, 16);
  return boxes.some((b, j) => j !== own && pieces.some((p) => overlaps(p, b)));
}

/** A thin line from the bar's centre to the nearest point of a label moved away from it. */
function leader(ctx: FigureContext, level: PlacedLevel, box: Box): PathItem {
  const x = Math.min(Math.max(level.x, box.x), box.x + box.w);
  const y = Math.min(Math.max(level.y, box.y), box.y + box.h);
  return {
    kind: 'path', role: 'leader', pathway: level.point.pathwayId, point: level.point.pointId,
    stroke: { colour: ctx.theme.muted, widthMm: 0.5 * ctx.strokeMm, cap: 'butt' },
    segments: [{ op: 'M', x: level.x, y: level.y }, { op: 'L', x, y }],
  };
}
