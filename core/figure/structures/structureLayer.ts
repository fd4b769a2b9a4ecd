import type { PointDrawing } from '../../structure/pointDepictions.ts';
import type { FigureContext } from '../figureContext.ts';
import { barBox, type PlacedLevel } from '../levels.ts';
import { pathPieces } from '../pathPieces.ts';
import type { Box, OmittedLabel, SceneItem } from '../scene.ts';
import { placeStructures } from './placeStructures.ts';
import { expectedHeight, structureSizing, type StructureSizing } from './structureSizing.ts';

/** Room the drawings need above the highest and below the lowest level, mm. */
export interface StructureRoom {
  sizing: StructureSizing;
  above: number;
  below: number;
}

/** How tall a figure of each preset may grow to make room for drawings (height / width; our choice: a slide keeps 16:9). */
const MAX_ASPECT = { single: 1, double: 0.8, slide: 9 / 16 } as const;

/** The sizes of the drawings and the room to keep for them at the top and bottom of the plot. */
export function structureRoom(ctx: FigureContext, drawings: ReadonlyMap<string, PointDrawing>, textScale: number): StructureRoom {
  const sizing = structureSizing(ctx.doc, ctx.sizeMm, ctx.strokeMm, textScale);
  let above = 0, below = 0;
  for (const d of drawings.values()) {
    const h = expectedHeight(d, sizing) + 3 * ctx.gapMm;
    if (d.side === 'above') above = Math.max(above, h);
    else below = Math.max(below, h);
  }
  return { sizing, above, below };
}

/**
 * The figure height once drawings need room: a height the user set is kept; otherwise the
 * preset's height grows by the room taken, up to the preset's tallest aspect.
 */
export function grownHeight(size: { widthMm: number; heightMm: number }, fixedHeight: boolean, preset: keyof typeof MAX_ASPECT, room: StructureRoom): number {
  if (fixedHeight || room.above + room.below === 0) return size.heightMm;
  return Math.max(size.heightMm, Math.min(size.widthMm * MAX_ASPECT[preset], size.heightMm + room.above + room.below));
}

/**
 * The drawings, placed after levels, connectors, labels and annotations, clear of all of
 * them: every bar, connector piece, label box and annotation mark is an obstacle.
 */
export function structureLayer(ctx: FigureContext, placed: readonly PlacedLevel[], items: readonly SceneItem[], drawings: ReadonlyMap<string, PointDrawing>, room: StructureRoom, labelBoxes: readonly Box[], bounds: Box): { items: SceneItem[]; omitted: OmittedLabel[] } {
  if (drawings.size === 0) return { items: [], omitted: [] };
  const boxes: Box[] = [...placed.map((l) => barBox(l, ctx)), ...labelBoxes];
  for (const item of items) {
    if (item.kind === 'path' && (item.role === 'connector' || item.role === 'errorBar' || item.role === 'arrow' || item.role === 'annotation' || item.role === 'leader')) boxes.push(...pathPieces(item.segments, (item.stroke?.widthMm ?? 0) / 2, 16));
    else if (item.kind === 'text') boxes.push(item.box);
  }
  const placedDrawings = placeStructures(ctx, placed, drawings, room.sizing, { boxes }, bounds);
  return { items: placedDrawings.items, omitted: placedDrawings.omitted };
}
