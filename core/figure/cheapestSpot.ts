import type { BoxIndex } from './boxIndex.ts';
import { RUN_EPS, runAt, type BlockedRuns, type ColumnIndex } from './columnIndex.ts';
import { runsCache, type RunsCache } from './runsCache.ts';
import type { Box } from './scene.ts';

/**
 * Extra cost of a clear spot for reasons the indexes cannot see (e.g. the label would sit
 * nearer another level than its own): 0 when fine, Infinity to refuse it.
 */
export type SpotJudge = (x: number, y: number, distance: number) => number;

/** One line of candidate spots: fixed x, top edge y0 + dir · distance, with an extra cost. */
export interface SpotLine {
  x: number;
  y0: number;
  dir: 1 | -1;
  extra: number;
}

/** What a search looks at, with scratch space reused from one search to the next. */
export interface SpotSearch {
  /** Bars and labels placed so far: `hard` and `columns` hold the same boxes. */
  hard: BoxIndex;
  columns: ColumnIndex;
  soft: BoxIndex;
  /** Blocked runs of whole columns (of `columns`), shared by lines and labels that look down the same one. */
  runs: RunsCache;
}

/** A search over the given indexes. */
export function spotSearch(hard: BoxIndex, columns: ColumnIndex, soft: BoxIndex): SpotSearch {
  return { hard, columns, soft, runs: runsCache(columns) };
}

/**
 * The cheapest clear spot for a w × h label on the given lines (in order of preference):
 * spots lie `step` apart along each line, up to `limit` steps; one is clear when, grown by
 * `gap`, it touches no hard box and lies inside `bounds`. Its cost is the distance plus
 * the line's extra, plus h when it crosses a soft box; a tie goes to the nearer spot, then
 * to the earlier line. Blocked stretches of a line are skipped whole, using the blocked
 * runs of its column (from `at.runs`, shared with other lines and labels down the same
 * column); every spot taken is confirmed by an exact test. `judge`, when given, adds to
 * the cost of each clear spot that could still win. Undefined when no spot is clear.
 */
export function cheapestSpot(lines: readonly SpotLine[], w: number, h: number, bounds: Box, gap: number, step: number, limit: number, at: SpotSearch, judge?: SpotJudge): { box: Box; distance: number } | undefined {
  const top = bounds.y;
  const bottom = bounds.y + bounds.h;
  let bestCost = Infinity;
  let bestI = -1;
  let bestY = 0;
  let bestX = 0;
  for (const line of lines) {
    const { x, y0, dir, extra } = line;
    if (x < bounds.x || x + w > bounds.x + bounds.w) continue;
    let runs: BlockedRuns | undefined;
    let i = 0;
    while (i <= limit) {
      const d = i * step;
      const base = d + extra;
      // Costs only grow along a line: once it cannot win, it never will.
      if (base > bestCost || (base === bestCost && i >= bestI)) break;
      const y = y0 + dir * d;
      if (dir < 0 ? y < top : y + h > bottom) break;
      if (y < top || y + h > bottom) {
        i++;
        continue;
      }
      let k = runs ? runAt(runs, y) : -1;
      if (k < 0 && at.hard.hitsAt(x, y, w, h, gap)) {
        if (!runs) {
          // The whole column, so the line looking the other way and the next labels of this slot can reuse it.
          runs = at.runs.get(x, w, h, gap, top, bottom - h);
          k = runAt(runs, y);
        }
        if (k < 0) {
          i++;
          continue;
        }
      }
      if (k >= 0) {
        // Jump to the first spot that may lie past the run; every spot before it is blocked.
        const past = dir > 0 ? runs!.hi[k]! - RUN_EPS - y0 : y0 - runs!.lo[k]! - RUN_EPS;
        i = Math.max(i + 1, Math.ceil(past / step));
        continue;
      }
      const cost = base + (at.soft.hitsAt(x, y, w, h, 0) ? h : 0) + (judge ? judge(x, y, d) : 0);
      if (cost < bestCost || (cost === bestCost && i < bestI)) {
        bestCost = cost;
        bestI = i;
        bestX = x;
        bestY = y;
      }
      i++;
    }
  }
  return bestI < 0 ? undefined : { box: { x: bestX, y: bestY, w, h }, distance: bestI * step };
}
