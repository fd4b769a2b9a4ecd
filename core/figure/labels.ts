import type { FigureContext } from './figureContext.ts';
import { blockItems, labelBlock, type LabelBlock, type LabelStyle } from './labelBlock.ts';
import { barBox, type PlacedLevel } from './levels.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import { placeLabels, type LabelRequest } from './placeLabels.ts';
import { boxIndex, type BoxIndex } from './boxIndex.ts';
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
  const byKey = new Map<string, Group[]>();
  for (const level of order) {
    const block = labelBlock(level.point.label, level.point.kind, level.point.energy!, style);
    const key = `${level.x.toFixed(4)}|${level.point.label}|${block.energyText}`;
    const twin = byKey.get(key)?.find((g) => Math.abs(g.level.y - level.y) < 0.5 * ctx.strokeMm);
    if (twin) twin.shared = true;
    else {
      const group = { level, block, shared: false };
      groups.push(group);
      byKey.set(key, [...(byKey.get(key) ?? []), group]);
    }
  }
  const requests: LabelRequest[] = groups.map(({ level, block }) => ({
    x: level.x, y: level.y, halfWidth: level.halfWidth, w: block.w, h: block.h,
    prefer: level.point.kind === 'ts' ? 'above' : 'below',
    ...(level.point.labelOffsetMm ? { fixed: level.point.labelOffsetMm } : {}),
  }));
  const placements = placeLabels(requests, { hard: placed.map((l) => barBox(l, ctx)), soft }, bounds, ctx.gapMm);
  const items: SceneItem[] = [];
  const boxes = placements.map((p) => p.box);
  const owners = new Map<Box, number>(boxes.map((b, i) => [b, i]));
  const index = boxIndex(Math.max(2, ...boxes.slice(0, 50).map((b) => b.w)));
  boxes.forEach(index.add);
  groups.forEach((g, i) => {
    const { box, displaced } = placements[i]!;
    const colour = g.shared ? ctx.theme.ink : paints.get(g.level.point.pathwayIndex)!.colour;
    const line = displaced ? leader(ctx, g.level, box) : null;
    // A leader that would cut through another label confuses more than it helps.
    if (line && !crossesOthers(line, index, owners, i)) items.push(line);
    items.push(...blockItems(g.block, box, ctx.theme.ink, colour, { pathway: g.level.point.pathwayId, point: g.level.point.pointId }));
  });
  return { items, boxes };
}

function crossesOthers(line: PathItem, index: BoxIndex, owners: ReadonlyMap<Box, number>, own: number): boolean {
  return pathPieces(line.segments, 0, 16).some((p) => index.touching(p).some((b) => owners.get(b) !== own));
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
