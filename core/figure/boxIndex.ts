import { overlaps } from './geometry.ts';
import type { Box } from './scene.ts';

/** A set of boxes that answers "does this box touch any?" quickly. */
export interface BoxIndex {
  add(box: Box): void;
  hits(box: Box, margin: number): boolean;
  /** Smallest top edge of all boxes added (Infinity when empty). */
  top(): number;
}

/** Uniform-grid index with square cells of `cellMm`; boxes are filed in every cell they cover. */
export function boxIndex(cellMm: number): BoxIndex {
  const cells = new Map<string, Box[]>();
  let top = Infinity;
  const range = (b: Box, margin: number) => ({
    i0: Math.floor((b.x - margin) / cellMm), i1: Math.floor((b.x + b.w + margin) / cellMm),
    j0: Math.floor((b.y - margin) / cellMm), j1: Math.floor((b.y + b.h + margin) / cellMm),
  });
  return {
    add(box) {
      const r = range(box, 0);
      for (let i = r.i0; i <= r.i1; i++) for (let j = r.j0; j <= r.j1; j++) {
        const key = `${i},${j}`;
        const list = cells.get(key);
        if (list) list.push(box);
        else cells.set(key, [box]);
      }
      top = Math.min(top, box.y);
    },
    hits(box, margin) {
      const r = range(box, margin);
      for (let i = r.i0; i <= r.i1; i++) for (let j = r.j0; j <= r.j1; j++) {
        const list = cells.get(`${i},${j}`);
        if (list?.some((b) => overlaps(box, b, margin))) return true;
      }
      return false;
    },
    top: () => top,
  };
}
