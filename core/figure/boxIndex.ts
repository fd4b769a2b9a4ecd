import { overlaps } from './geometry.ts';
import type { Box } from './scene.ts';

/** A set of boxes that answers "does this box touch any?" quickly. */
export interface BoxIndex {
  add(box: Box): void;
  hits(box: Box, margin: number): boolean;
  /** Like `hits`, for a box given by its numbers (no allocation on the hot path); `except` is not counted. */
  hitsAt(x: number, y: number, w: number, h: number, margin: number, except?: Box): boolean;
  /**
   * How far a box at (x, y, w, h) must move along y (dir −1 up, +1 down) before it comes
   * clear of every box it now touches (closer than `margin`): 0 when it touches none.
   */
  clearance(x: number, y: number, w: number, h: number, margin: number, dir: 1 | -1): number;
  /** The boxes that share interior area with `box`, each once, in the order added per cell. */
  touching(box: Box): Box[];
}

/** Uniform-grid index with square cells of `cellMm`; boxes are filed in every cell they cover. */
export function boxIndex(cellMm: number): BoxIndex {
  const cells = new Map<number, Box[]>();
  // Numeric cell keys (no string building on the hot path); rows wrap far beyond any figure.
  const key = (i: number, j: number) => i * 1_000_003 + j;
  const cell = (v: number) => Math.floor(v / cellMm);
  const index: BoxIndex = {
    add(box) {
      for (let i = cell(box.x); i <= cell(box.x + box.w); i++) for (let j = cell(box.y); j <= cell(box.y + box.h); j++) {
        const k = key(i, j);
        const list = cells.get(k);
        if (list) list.push(box);
        else cells.set(k, [box]);
      }
    },
    hits: (b, margin) => index.hitsAt(b.x, b.y, b.w, b.h, margin),
    hitsAt(x, y, w, h, margin, except) {
      for (let i = cell(x - margin); i <= cell(x + w + margin); i++) for (let j = cell(y - margin); j <= cell(y + h + margin); j++) {
        const list = cells.get(key(i, j));
        if (!list) continue;
        for (const b of list) if (b !== except && x < b.x + b.w + margin && b.x < x + w + margin && y < b.y + b.h + margin && b.y < y + h + margin) return true;
      }
      return false;
    },
    clearance(x, y, w, h, margin, dir) {
      let need = 0;
      for (let i = cell(x - margin); i <= cell(x + w + margin); i++) for (let j = cell(y - margin); j <= cell(y + h + margin); j++) {
        const list = cells.get(key(i, j));
        if (!list) continue;
        for (const b of list) {
          if (!(x < b.x + b.w + margin && b.x < x + w + margin && y < b.y + b.h + margin && b.y < y + h + margin)) continue;
          const move = dir > 0 ? b.y + b.h + margin - y : y + h + margin - b.y;
          if (move > need) need = move;
        }
      }
      return need;
    },
    touching(box) {
      const found = new Set<Box>();
      for (let i = cell(box.x); i <= cell(box.x + box.w); i++) for (let j = cell(box.y); j <= cell(box.y + box.h); j++) {
        for (const b of cells.get(key(i, j)) ?? []) if (overlaps(box, b)) found.add(b);
      }
      return [...found];
    },
  };
  return index;
}
