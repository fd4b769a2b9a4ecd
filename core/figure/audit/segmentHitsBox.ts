import type { Box } from '../scene.ts';

/**
 * True when the segment (x0, y0)–(x1, y1) passes through the open interior of `box`
 * (Liang–Barsky clipping: Y.-D. Liang, B. A. Barsky, "A new concept and method for line
 * clipping", ACM Trans. Graph. 3, 1 (1984)). A segment that only touches an edge does not count.
 */
export function segmentHitsBox(x0: number, y0: number, x1: number, y1: number, box: Box): boolean {
  const dx = x1 - x0;
  const dy = y1 - y0;
  let t0 = 0;
  let t1 = 1;
  const clip = (p: number, q: number): boolean => {
    if (p === 0) return q > 0;
    const r = q / p;
    if (p < 0) {
      if (r >= t1) return false;
      if (r > t0) t0 = r;
    } else {
      if (r <= t0) return false;
      if (r < t1) t1 = r;
    }
    return true;
  };
  return clip(-dx, x0 - box.x) && clip(dx, box.x + box.w - x0) && clip(-dy, y0 - box.y) && clip(dy, box.y + box.h - y0) && t0 < t1;
}
