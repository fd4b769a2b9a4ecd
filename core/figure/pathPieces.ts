import type { Box, Segment } from './scene.ts';

/**
 * Small boxes covering a stroked path: each line or cubic is cut into `pieces` parts and
 * each part's bounding box, grown by half the stroke width, is returned. Thin boxes along
 * a diagonal leave the space beside it free, unlike one box around the whole line.
 */
export function pathPieces(segments: readonly Segment[], halfWidth: number, pieces = 8): Box[] {
  const boxes: Box[] = [];
  let x = 0;
  let y = 0;
  const piece = (x0: number, y0: number, x1: number, y1: number) => boxes.push({
    x: Math.min(x0, x1) - halfWidth, y: Math.min(y0, y1) - halfWidth,
    w: Math.abs(x1 - x0) + 2 * halfWidth, h: Math.abs(y1 - y0) + 2 * halfWidth,
  });
  for (const s of segments) {
    if (s.op === 'M') [x, y] = [s.x, s.y];
    else if (s.op === 'L' || s.op === 'C') {
      let px = x;
      let py = y;
      for (let k = 1; k <= pieces; k++) {
        const [qx, qy] = s.op === 'L' ? [x + ((s.x - x) * k) / pieces, y + ((s.y - y) * k) / pieces] : cubicAt(x, y, s, k / pieces);
        piece(px, py, qx, qy);
        [px, py] = [qx, qy];
      }
      [x, y] = [s.x, s.y];
    }
  }
  return boxes;
}

/** Point of a cubic Bézier at parameter t (Bernstein form). */
export function cubicAt(x0: number, y0: number, c: Extract<Segment, { op: 'C' }>, t: number): [number, number] {
  const u = 1 - t;
  const a = u * u * u;
  const b = 3 * u * u * t;
  const d = 3 * u * t * t;
  const e = t * t * t;
  return [a * x0 + b * c.x1 + d * c.x2 + e * c.x, a * y0 + b * c.y1 + d * c.y2 + e * c.y];
}
