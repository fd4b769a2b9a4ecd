import type { Segment } from './scene.ts';

/**
 * A vertical double-headed arrow from y0 to y1 at x: the shaft between the heads and two
 * filled triangular heads touching the ends. Heads shrink on arrows shorter than two heads.
 */
export function doubleArrow(x: number, y0: number, y1: number, head: number): { shaft: Segment[]; heads: Segment[] } {
  const dir = y1 >= y0 ? 1 : -1;
  const size = Math.min(head, Math.abs(y1 - y0) / 2);
  const half = size * 0.4;
  const tip = (y: number, toward: number): Segment[] => [
    { op: 'M', x, y }, { op: 'L', x: x - half, y: y - toward * size }, { op: 'L', x: x + half, y: y - toward * size }, { op: 'Z' },
  ];
  return {
    shaft: [{ op: 'M', x, y: y0 + dir * size }, { op: 'L', x, y: y1 - dir * size }],
    heads: [...tip(y0, -dir), ...tip(y1, dir)],
  };
}
