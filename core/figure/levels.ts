import type { LayoutPathway, LayoutPoint } from './collectPoints.ts';
import { connectorSegments } from './connectorSegments.ts';
import { BAR_WEIGHT, type FigureContext } from './figureContext.ts';
import { dashOf } from './legend.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import type { Box, SceneItem } from './scene.ts';

/** A drawn level: where its bar is. */
export interface PlacedLevel {
  point: LayoutPoint;
  x: number;
  y: number;
  halfWidth: number;
  /** Boxes of its error bar (see errorBars.ts), which count as part of the level. */
  errorBar?: readonly Box[];
}

/**
 * Bars for every point with a known energy and connectors between neighbours (a point
 * of unknown energy breaks the line). Connectors run from bar end to bar end, or centre
 * to centre when bars overlap.
 */
export function levels(ctx: FigureContext, pathway: LayoutPathway, paint: PathwayPaint, place: (p: LayoutPoint) => PlacedLevel | null): { items: SceneItem[]; placed: PlacedLevel[] } {
  const connectors: SceneItem[] = [];
  const bars: SceneItem[] = [];
  const placed: PlacedLevel[] = [];
  const connectorStroke = { colour: paint.colour, widthMm: ctx.strokeMm, cap: 'butt' as const, ...dashOf(paint, ctx.strokeMm) };
  let previous: PlacedLevel | null = null;
  for (const point of pathway.points) {
    const level = place(point);
    if (level && previous) {
      const a = { x: previous.x + previous.halfWidth, y: previous.y };
      const b = { x: level.x - level.halfWidth, y: level.y };
      const [from, to] = a.x <= b.x ? [a, b] : [{ x: previous.x, y: previous.y }, { x: level.x, y: level.y }];
      connectors.push({ kind: 'path', role: 'connector', pathway: pathway.id, stroke: connectorStroke, segments: connectorSegments(from, to, ctx.doc.figure.connector) });
    }
    if (level) {
      bars.push({
        kind: 'path', role: 'level', pathway: pathway.id, point: point.pointId,
        stroke: { colour: paint.colour, widthMm: paint.weight * ctx.strokeMm, cap: 'butt' },
        segments: [{ op: 'M', x: level.x - level.halfWidth, y: level.y }, { op: 'L', x: level.x + level.halfWidth, y: level.y }],
      });
      placed.push(level);
    }
    previous = level;
  }
  return { items: [...connectors, ...bars], placed };
}

/** The box a bar occupies, its stroke thickness included. */
export function barBox(level: PlacedLevel, ctx: FigureContext, weight = BAR_WEIGHT): Box {
  const half = (weight * ctx.strokeMm) / 2;
  return { x: level.x - level.halfWidth, y: level.y - half, w: 2 * level.halfWidth, h: 2 * half };
}
