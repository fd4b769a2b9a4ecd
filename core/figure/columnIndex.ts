import type { Box } from './scene.ts';

/** Sorted, merged ranges of top edges (see `ColumnIndex.blocked`): the first `n` entries of lo and hi. */
export interface BlockedRuns {
  lo: Float64Array;
  hi: Float64Array;
  n: number;
}

/** An empty, reusable BlockedRuns. */
export function blockedRuns(): BlockedRuns {
  return { lo: new Float64Array(32), hi: new Float64Array(32), n: 0 };
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
   * Writes into `out` where a w × h box at x cannot sit: every top edge y with
   * lo[k] + RUN_EPS < y < hi[k] − RUN_EPS puts it closer than `margin` to some box added.
   * Tops outside these ranges (or within RUN_EPS of their ends) are undecided and need an
   * exact test, as are all tops outside [from, to].
   */
  blocked(x: number, w: number, h: number, margin: number, from: number, to: number, out: BlockedRuns): void;
  /** A number that changes whenever a box is added to a strip that `blocked(x, w, …, margin, …)` reads. */
  version(x: number, w: number, margin: number): number;
}

/** A column index with strips `stripMm` wide; a box is filed in every strip it covers. */
export function columnIndex(stripMm: number): ColumnIndex {
  const strips = new Map<number, Box[]>();
  // When each strip last had a box added (a count of adds).
  const stamps = new Map<number, number>();
  const strip = (v: number) => Math.floor(v / stripMm);
  let tallest = 0;
  let adds = 0;
  // Scratch for the merge, reused between calls.
  const lists: Box[][] = [];
  let at = new Int32Array(8);
  let end = new Int32Array(8);
  return {
    add(original) {
      // A private copy: every box in the strips then has one shape, which keeps the merge fast.
      const box: Box = { x: original.x, y: original.y, w: original.w, h: original.h };
      tallest = Math.max(tallest, box.h);
      adds++;
      for (let i = strip(box.x); i <= strip(box.x + box.w); i++) {
        stamps.set(i, adds);
        const list = strips.get(i);
        if (!list) strips.set(i, [box]);
        else list.splice(firstBelow(list, box.y, true), 0, box);
      }
    },
    blocked(x, w, h, margin, from, to, out) {
      let k = 0;
      for (let i = strip(x - margin); i <= strip(x + w + margin); i++) {
        const list = strips.get(i);
        if (!list) continue;
        if (k === at.length) {
          const [a, e] = [new Int32Array(2 * k), new Int32Array(2 * k)];
          a.set(at);
          e.set(end);
          [at, end] = [a, e];
        }
        lists[k] = list;
        // Only boxes that can block a top in [from, to].
        at[k] = firstBelow(list, from - margin - tallest, false);
        end[k] = firstBelow(list, to + h + margin, false);
        k++;
      }
      out.n = 0;
      mergeRuns(lists, at, end, k, x, w, h, margin, out);
    },
    version(x, w, margin) {
      let latest = 0;
      for (let i = strip(x - margin); i <= strip(x + w + margin); i++) latest = Math.max(latest, stamps.get(i) ?? 0);
      return latest;
    },
  };
}

/** Walks the strips' boxes in order of top edge (a k-way merge) and joins overlapping ranges. */
function mergeRuns(lists: readonly Box[][], at: Int32Array, end: Int32Array, count: number, x: number, w: number, h: number, margin: number, out: BlockedRuns): void {
  for (;;) {
    let pick = -1;
    let pickY = Infinity;
    let b: Box | undefined;
    for (let k = 0; k < count; k++) {
      const i = at[k]!;
      if (i >= end[k]!) continue;
      const head = lists[k]![i]!;
      if (head.y < pickY) {
        pick = k;
        pickY = head.y;
        b = head;
      }
    }
    if (!b) return;
    at[pick]!++;
    const left = b.x;
    if (!(x < left + b.w + margin && left < x + w + margin)) continue;
    const top = pickY - h - margin;
    const bottom = pickY + b.h + margin;
    const n = out.n;
    // Join only with a clear overlap, so a point near a joint is deep inside one of the two.
    if (n > 0 && top < out.hi[n - 1]! - 2 * RUN_EPS) {
      if (bottom > out.hi[n - 1]!) out.hi[n - 1] = bottom;
    } else {
      if (n === out.lo.length) grow(out);
      out.lo[n] = top;
      out.hi[n] = bottom;
      out.n = n + 1;
    }
  }
}

function grow(out: BlockedRuns): void {
  const lo = new Float64Array(2 * out.lo.length);
  const hi = new Float64Array(2 * out.lo.length);
  lo.set(out.lo);
  hi.set(out.hi);
  out.lo = lo;
  out.hi = hi;
}

/** Index of the first box (sorted by top edge) whose top lies below y, or at y too unless `strict`. */
function firstBelow(list: readonly Box[], y: number, strict: boolean): number {
  let a = 0;
  let b = list.length;
  while (a < b) {
    const m = (a + b) >> 1;
    if (list[m]!.y < y || (strict && list[m]!.y === y)) a = m + 1;
    else b = m;
  }
  return a;
}

/** Index of the run that holds y deeper than RUN_EPS, or −1. */
export function runAt(runs: BlockedRuns, y: number): number {
  let a = 0;
  let b = runs.n;
  while (a < b) {
    const m = (a + b) >> 1;
    if (runs.lo[m]! + RUN_EPS < y) a = m + 1;
    else b = m;
  }
  const k = a - 1;
  return k >= 0 && y < runs.hi[k]! - RUN_EPS ? k : -1;
}
