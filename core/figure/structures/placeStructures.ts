import { pointKey } from '../../structure/readStructures.ts';
import type { PointDrawing } from '../../structure/pointDepictions.ts';
import { boxIndex } from '../boxIndex.ts';
import type { FigureContext } from '../figureContext.ts';
import { inside } from '../geometry.ts';
import type { PlacedLevel } from '../levels.ts';
import type { Box, OmittedLabel, SceneItem } from '../scene.ts';
import { depictionItems } from './depictionItems.ts';
import { bondLength, type StructureSizing } from './structureSizing.ts';

/** Everything a drawing must keep clear of: bars, connector pieces, labels, annotation marks. */
export interface StructureObstacles {
  boxes: readonly Box[];
}

/** Name of the scene group holding one point's drawing. */
export const structureGroup = (pathway: string, point: string): string => `structure ${pathway} ${point}`;

/**
 * Places each point's molecule drawing beside its level, on the chosen side: centred over
 * (or under) the bar first, then shifted sideways and moved away from the bar step by step,
 * taking the first spot whose box (grown by the gap) touches no obstacle and no drawing
 * placed before it and lies inside `bounds`. When the chosen side has no such spot the other
 * side is tried; a drawing with no spot at all is left out and listed in `omitted`.
 * Greedy and deterministic, levels taken left to right. Returns the items and the boxes.
 */
export function placeStructures(ctx: FigureContext, placed: readonly PlacedLevel[], drawings: ReadonlyMap<string, PointDrawing>, sizing: StructureSizing, obstacles: StructureObstacles, bounds: Box): { items: SceneItem[]; boxes: Box[]; omitted: OmittedLabel[] } {
  const gap = ctx.gapMm;
  const index = boxIndex(Math.max(2, sizing.sizeMm / 2));
  obstacles.boxes.forEach(index.add);
  const items: SceneItem[] = [];
  const boxes: Box[] = [];
  const omitted: OmittedLabel[] = [];
  const names = new Map(ctx.doc.pathways.map((p) => [p.id, p.name]));
  const seen = new Set<string>();
  const order = [...placed].sort((a, b) => a.x - b.x || a.point.pathwayIndex - b.point.pathwayIndex);
  for (const level of order) {
    const { pathwayId: pathway, pointId: point, label } = level.point;
    const key = pointKey(pathway, point);
    const drawing = drawings.get(key);
    if (!drawing || seen.has(key)) continue;
    seen.add(key);
    const style = { bondMm: bondLength(drawing.depiction, sizing), strokeMm: sizing.strokeMm, labelMm: sizing.labelMm, colour: ctx.theme.ink, metrics: ctx.metrics, pathway, point, group: structureGroup(pathway, point) };
    const probe = depictionItems(drawing.depiction, style, 0, 0).box;
    // Farther than this from its bar a drawing no longer reads as belonging to it (our choice).
    const reach = 2 * probe.h + 4 * ctx.lineMm;
    const spot = findSpot(level, probe, drawing.side, index, bounds, gap, reach) ?? findSpot(level, probe, drawing.side === 'above' ? 'below' : 'above', index, bounds, gap, reach);
    if (!spot) {
      omitted.push({ kind: 'structure', pathway, point, pathwayName: names.get(pathway) ?? pathway, label });
      continue;
    }
    const drawn = depictionItems(drawing.depiction, style, spot.x - probe.x, spot.y - probe.y);
    items.push(...drawn.items);
    boxes.push(drawn.box);
    index.add(drawn.box);
  }
  return { items, boxes, omitted };
}

function findSpot(level: PlacedLevel, probe: Box, side: 'above' | 'below', index: ReturnType<typeof boxIndex>, bounds: Box, gap: number, reach: number): Box | null {
  const { w, h } = probe;
  const dir = side === 'above' ? -1 : 1;
  const shifts = [0, -0.25, 0.25, -0.5, 0.5, -0.75, 0.75, -1, 1].map((f) => f * (w + 2 * gap));
  for (const shift of shifts) {
    const x = level.x - w / 2 + shift;
    let y = side === 'above' ? level.y - 2 * gap - h : level.y + 2 * gap;
    for (let step = 0; step < 200; step++) {
      const box = { x, y, w, h };
      if (!inside(box, bounds) || (side === 'above' ? level.y - y : y + h - level.y) > reach + h) break;
      const move = index.clearance(x, y, w, h, gap, dir as 1 | -1);
      if (move === 0) return box;
      y += dir * Math.max(move, gap);
    }
  }
  return null;
}
