import type { Box, Segment } from './scene.ts';

/**
 * Small boxes covering a stroked path: each line or cubic is cut into `pieces` parts and
 * each part's bounding box, grown by half the stroke width, is returned. Thin boxes along
 * a diagonal leave the space beside it free, unlike one box around the whole line.
 */
export function pathPieces(segments: readonly Segment[], halfWidth: number, pieces = 8): Box[] {
  const boxes: Box[] = [];
  eachPiece(segments, halfWidth, pieces, (x, y, w, h) => {
    boxes.push({ x, y, w, h });
    return false;
  });
  return boxes;
}

/**
 * The boxes of `pathPieces`, in the same order, handed to `visit` as numbers (nothing is
 * allocated per piece); stops early, returning true, when `visit` returns true.
 */
export function eachPiece(segments: readonly Segment[], halfWidth: number, pieces: number, visit: (x: number, y: number, w: number, h: number) => boolean): boolean {
  let x = 0;
  let y = 0;
  for (const s of segments) {
    if (s.op === 'M') {
      x = s.x;
      y = s.y;
    } else if (s.op === 'L' || s.op === 'C') {
      let px = x;
      let py = y;
      for (let k = 1; k <= pieces; k++) {
        let qx: number;
        let qy: number;
        if (s.op === 'L') {
          qx = x + ((s.x - x) * k) / pieces;
          qy = y + ((s.y - y) * k) / pieces;
        } else {
          // cubicAt, spelt out so no pair is allocated per piece.
          const t = k / pieces;
          const u = 1 - t;
          const a = u * u * u;
          const b = 3 * u * u * t;
          const d = 3 * u * t * t;
          const e = t * t * t;
          qx = a * x + b * s.x1 + d * s.x2 + e * s.x;
          qy = a * y + b * s.y1 + d * s.y2 + e * s.y;
        }
        if (visit(Math.min(px, qx) - halfWidth, Math.min(py, qy) - halfWidth, Math.abs(qx - px) + 2 * halfWidth, Math.abs(qy - py) + 2 * halfWidth)) return true;
        px = qx;
        py = qy;
      }
      x = s.x;
      y = s.y;
    }
  }
  return false;
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
