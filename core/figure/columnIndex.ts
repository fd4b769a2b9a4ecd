import type { Box } from './scene.ts';

/** Sorted, merged ranges of top edges (see `ColumnIndex.blocked`), as parallel arrays. */
export interface BlockedRuns {
  lo: number[];
  hi: number[];
}

/**
 * Safety margin, mm: a run only claims the tops lying deeper than this inside it, far
 * beyond floating-point error (~1e-13 mm here), so a claim never contradicts an exact test.
 */
export const RUN_EPS = 1e-7;

/** Boxes filed in vertical strips, each strip kept sorted by top edge. */
export interface ColumnIndex {
  add(box: Box): void;
  /**
   * Where a w × h box at x cannot sit: every top edge y with lo[k] + RUN_EPS < y <
   * hi[k] − RUN_EPS puts it closer than `margin` to some box added. Tops outside these
   * ranges (or within RUN_EPS of their ends) are undecided and need an exact test, as are
   * all tops outside [from, to].
   */
  blocked(x: number, w: number, h: number, margin: number, from: number, to: number): BlockedRuns;
}

/** A column index with strips `stripMm` wide; a box is filed in every strip it covers. */
export function columnIndex(stripMm: number): ColumnIndex {
  const strips = new Map<number, Box[]>();
  const strip = (v: number) => Math.floor(v / stripMm);
  let tallest = 0;
  return {
    add(box) {
      tallest = Math.max(tallest, box.h);
      for (let i = strip(box.x); i <= strip(box.x + box.w); i++) {
        const list = strips.get(i);
        if (!list) {
          strips.set(i, [box]);
          continue;
        }
        let a = 0;
        let b = list.length;
        while (a < b) {
          const m = (a + b) >> 1;
          if (list[m]!.y <= box.y) a = m + 1;
          else b = m;
        }
        list.splice(a, 0, box);
      }
    },
    blocked(x, w, h, margin, from, to) {
      const lists: Box[][] = [];
      for (let i = strip(x - margin); i <= strip(x + w + margin); i++) {
        const list = strips.get(i);
        if (list) lists.push(list);
      }
      return mergeRuns(lists, x, w, h, margin, from, to, tallest);
    },
  };
}

/**
 * Walks the strips' boxes in order of top edge (a k-way merge) and joins overlapping
 * ranges. Only boxes that can block a top in [from, to] are looked at; `tallest` bounds
 * the heights of the boxes in the strips.
 */
function mergeRuns(lists: readonly Box[][], x: number, w: number, h: number, margin: number, from: number, to: number, tallest: number): BlockedRuns {
  const lo: number[] = [];
  const hi: number[] = [];
  const at: number[] = [];
  const end: number[] = [];
  for (const list of lists) {
    at.push(firstAtOrBelow(list, from - margin - tallest));
    end.push(firstAtOrBelow(list, to + h + margin));
  }
  for (;;) {
    let pick = -1;
    let pickY = Infinity;
    for (let k = 0; k < lists.length; k++) {
      if (at[k]! >= end[k]!) continue;
      const y = lists[k]![at[k]!]!.y;
      if (y < pickY) {
        pick = k;
        pickY = y;
      }
    }
    if (pick < 0) return { lo, hi };
    const b = lists[pick]![at[pick]!]!;
    at[pick]!++;
    if (!(x < b.x + b.w + margin && b.x < x + w + margin)) continue;
    const top = b.y - h - margin;
    const bottom = b.y + b.h + margin;
    const n = lo.length;
    // Join only with a clear overlap, so a point near a joint is deep inside one of the two.
    if (n > 0 && top < hi[n - 1]! - 2 * RUN_EPS) hi[n - 1] = Math.max(hi[n - 1]!, bottom);
    else {
      lo.push(top);
      hi.push(bottom);
    }
  }
}

/** Index of the first box in a list sorted by top edge whose top is at or below y. */
function firstAtOrBelow(list: readonly Box[], y: number): number {
  let a = 0;
  let b = list.length;
  while (a < b) {
    const m = (a + b) >> 1;
    if (list[m]!.y < y) a = m + 1;
    else b = m;
  }
  return a;
}

/** Index of the run that holds y deeper than RUN_EPS, or −1. */
export function runAt(runs: BlockedRuns, y: number): number {
  let a = 0;
  let b = runs.lo.length;
  while (a < b) {
    const m = (a + b) >> 1;
    if (runs.lo[m]! + RUN_EPS < y) a = m + 1;
    else b = m;
  }
  const k = a - 1;
  return k >= 0 && y < runs.hi[k]! - RUN_EPS ? k : -1;
}
