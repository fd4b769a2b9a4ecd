import type { LayoutPoint } from './collectPoints.ts';
import type { FigureContext } from './figureContext.ts';
import { blockItems, labelBlock, type LabelBlock, type LabelStyle } from './labelBlock.ts';
import { barBox, type PlacedLevel } from './levels.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import { placeLabels, type LabelRequest } from './placeLabels.ts';
import { boxIndex, type BoxIndex } from './boxIndex.ts';
import { eachPiece } from './pathPieces.ts';
import type { AnnotationLabel } from './annotationShapes.ts';
import type { Box, OmittedLabel, PathItem, SceneItem } from './scene.ts';
import { textItem } from './text/textItem.ts';

interface Group {
  level: PlacedLevel;
  block: LabelBlock;
  shared: boolean;
}

/**
 * Labels for all levels: one per level, except that levels at the same spot with the same
 * name and printed energy (a state shared by several pathways) get one label in ink.
 * Placed in slot order, then pathway order, away from every bar and each other, and
 * off the connectors where a spot near the bar allows. Annotation labels (`extra`) are
 * placed after them, by the same rules, beside their arrows. `measured` holds blocks
 * already built for some points (with this same style), so they are not built twice.
 * A label with no clear spot inside `bounds` is left out (see placeLabels) and listed in
 * `omitted`, in placement order. Returns the items and the drawn label boxes (for tests
 * and hit-testing).
 */
export function labels(ctx: FigureContext, placed: readonly PlacedLevel[], paints: ReadonlyMap<number, PathwayPaint>, bounds: Box, soft: readonly Box[], extra: { hard: readonly Box[]; labels: readonly AnnotationLabel[] } = { hard: [], labels: [] }, measured: ReadonlyMap<LayoutPoint, LabelBlock> = new Map()): { items: SceneItem[]; boxes: Box[]; annotationBoxes: Box[]; omitted: OmittedLabel[] } {
  const style: LabelStyle = {
    metrics: ctx.metrics, sizeMm: ctx.sizeMm, decimals: ctx.doc.settings.decimals,
    energyFormat: ctx.doc.figure.energyFormat, unit: ctx.unit, daggerOnTs: ctx.doc.figure.daggerOnTs, autoSubscript: ctx.autoSubscript,
  };
  const order = [...placed].sort((a, b) => a.x - b.x || a.point.pathwayIndex - b.point.pathwayIndex || a.y - b.y);
  const groups: Group[] = [];
  const byKey = new Map<string, Group[]>();
  for (const level of order) {
    const block = measured.get(level.point) ?? labelBlock(level.point.label, level.point.kind, level.point.energy!, style);
    const key = `${level.x.toFixed(4)}|${level.point.label}|${block.energyText}`;
    const twin = byKey.get(key)?.find((g) => Math.abs(g.level.y - level.y) < 0.5 * ctx.strokeMm);
    if (twin) twin.shared = true;
    else {
      const group = { level, block, shared: false };
      groups.push(group);
      const same = byKey.get(key);
      if (same) same.push(group);
      else byKey.set(key, [group]);
    }
  }
  const requests: LabelRequest[] = groups.map(({ level, block }) => ({
    x: level.x, y: level.y, halfWidth: level.halfWidth, w: block.w, h: block.h,
    prefer: level.point.kind === 'ts' ? 'above' : 'below',
    ...(level.point.labelOffsetMm ? { fixed: level.point.labelOffsetMm } : {}),
  }));
  const all = placeLabels([...requests, ...extra.labels.map((l) => l.request)], { hard: [...placed.map((l) => barBox(l, ctx)), ...extra.hard], soft }, bounds, ctx.gapMm);
  const placements = all.slice(0, requests.length);
  const items: SceneItem[] = [];
  const omitted: OmittedLabel[] = [];
  const names = new Map(ctx.doc.pathways.map((p) => [p.id, p.name]));
  const boxes = placements.filter((p) => p !== null).map((p) => p.box);
  const index = boxIndex(Math.max(2, ...boxes.slice(0, 50).map((b) => b.w)));
  boxes.forEach(index.add);
  groups.forEach((g, i) => {
    const placement = placements[i];
    const { pathwayId: pathway, pointId: point, label } = g.level.point;
    if (!placement) {
      omitted.push({ kind: 'level', pathway, point, pathwayName: names.get(pathway) ?? pathway, label });
      return;
    }
    const { box, displaced } = placement;
    const colour = g.shared ? ctx.theme.ink : paints.get(g.level.point.pathwayIndex)!.colour;
    const line = displaced ? leader(ctx, g.level, box) : null;
    // A leader that would cut through another label confuses more than it helps.
    if (line && !crossesOthers(line, index, box)) items.push(line);
    items.push(...blockItems(g.block, box, ctx.theme.ink, colour, { pathway, point }));
  });
  const annotationBoxes: Box[] = [];
  all.slice(requests.length).forEach((p, k) => {
    const { request, lines, annotation, pathway } = extra.labels[k]!;
    if (!p) {
      const text = lines.map((l) => l.runs.map((r) => r.text).join('')).join(' ');
      omitted.push({ kind: 'annotation', annotation, pathway, pathwayName: names.get(pathway) ?? pathway, text });
      return;
    }
    if (p.displaced) items.push(leaderLine(ctx, request.x, request.y, p.box));
    let top = p.box.y;
    for (const l of lines) {
      items.push(textItem(l, p.box.x, top + l.ascent, ctx.theme.ink, 'annotation'));
      top += l.ascent + l.descent;
    }
    annotationBoxes.push(p.box);
  });
  return { items, boxes, annotationBoxes, omitted };
}

function crossesOthers(line: PathItem, index: BoxIndex, own: Box): boolean {
  return eachPiece(line.segments, 0, 16, (x, y, w, h) => index.hitsAt(x, y, w, h, 0, own));
}

/** A thin line from the bar's centre to the nearest point of a label moved away from it. */
function leader(ctx: FigureContext, level: PlacedLevel, box: Box): PathItem {
  const line = leaderLine(ctx, level.x, level.y, box);
  line.pathway = level.point.pathwayId;
  line.point = level.point.pointId;
  return line;
}

function leaderLine(ctx: FigureContext, fromX: number, fromY: number, box: Box): PathItem {
  const x = Math.min(Math.max(fromX, box.x), box.x + box.w);
  const y = Math.min(Math.max(fromY, box.y), box.y + box.h);
  return {
    kind: 'path', role: 'leader',
    stroke: { colour: ctx.theme.muted, widthMm: 0.5 * ctx.strokeMm, cap: 'butt' },
    segments: [{ op: 'M', x: fromX, y: fromY }, { op: 'L', x, y }],
  };
}
