import type { Figure } from '../model/schema.ts';
import type { Segment } from './scene.ts';

/** One end of a connector: the bar's end point at the level's height. */
export interface End {
  x: number;
  y: number;
}

/**
 * Segments joining two levels. Straight for "dashed" and "line". For "curve", one cubic
 * Bézier whose control points sit at the heights of their own end points, half-way
 * across: the tangent is horizontal at both levels, and because y(t) = y0 + (y1 − y0)
 * (3t² − 2t³) is monotone in t, the curve never rises above or dips below its two levels.
 */
export function connectorSegments(a: End, b: End, connector: Figure['connector']): Segment[] {
  if (connector !== 'curve') return [{ op: 'M', x: a.x, y: a.y }, { op: 'L', x: b.x, y: b.y }];
  const half = (b.x - a.x) / 2;
  return [
    { op: 'M', x: a.x, y: a.y },
    { op: 'C', x1: a.x + half, y1: a.y, x2: b.x - half, y2: b.y, x: b.x, y: b.y },
  ];
}
