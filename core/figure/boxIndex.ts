import { overlaps } from './geometry.ts';
import type { Box } from './scene.ts';

/** A set of boxes that answers "does this box touch any?" quickly. */
export interface BoxIndex {
  add(box: Box): void;
  hits(box: Box, margin: number): boolean;
  /** The boxes that share interior area with `box`, each once, in the order added per cell. */
  touching(box: Box): Box[];
  /** Smallest top edge of all boxes added (Infinity when empty). */
  top(): number;
}

/** Uniform-grid index with square cells of `cellMm`; boxes are filed in every cell they cover. */
export function boxIndex(cellMm: number): BoxIndex {
  const cells = new Map<number, Box[]>();
  // Numeric cell keys (no string building on the hot path); rows wrap far beyond any figure.
  const key = (i: number, j: number) => i * 1_000_003 + j;
  let top = Infinity;
  const range = (b: Box, margin: number) => ({
    i0: Math.floor((b.x - margin) / cellMm), i1: Math.floor((b.x + b.w + margin) / cellMm),
    j0: Math.floor((b.y - margin) / cellMm), j1: Math.floor((b.y + b.h + margin) / cellMm),
  });
  return {
    add(box) {
      const r = range(box, 0);
      for (let i = r.i0; i <= r.i1; i++) for (let j = r.j0; j <= r.j1; j++) {
        const k = key(i, j);
        const list = cells.get(k);
        if (list) list.push(box);
        else cells.set(k, [box]);
      }
      top = Math.min(top, box.y);
    },
    hits(box, margin) {
      const r = range(box, margin);
      for (let i = r.i0; i <= r.i1; i++) for (let j = r.j0; j <= r.j1; j++) {
        const list = cells.get(key(i, j));
        if (list?.some((b) => overlaps(box, b, margin))) return true;
      }
      return false;
    },
    touching(box) {
      const found = new Set<Box>();
      const r = range(box, 0);
      for (let i = r.i0; i <= r.i1; i++) for (let j = r.j0; j <= r.j1; j++) {
        for (const b of cells.get(key(i, j)) ?? []) if (overlaps(box, b)) found.add(b);
      }
      return [...found];
    },
    top: () => top,
  };
}
