import { blockedRuns, type BlockedRuns, type ColumnIndex } from './columnIndex.ts';

/** Blocked runs of whole columns, computed once and reused until a box lands in their strips. */
export interface RunsCache {
  /** `columns.blocked(x, w, h, margin, from, to, …)`, from the cache when nothing it read has changed since. */
  get(x: number, w: number, h: number, margin: number, from: number, to: number): BlockedRuns;
}

interface Entry {
  x: number;
  w: number;
  h: number;
  margin: number;
  from: number;
  to: number;
  version: number;
  runs: BlockedRuns;
}

/**
 * A cache of the last `size` columns asked for (replaced in turn). Labels of one slot ask
 * for the same columns one after another; while none of them is placed, the runs stand.
 */
export function runsCache(columns: ColumnIndex, size = 8): RunsCache {
  const entries: Entry[] = [];
  let next = 0;
  return {
    get(x, w, h, margin, from, to) {
      const version = columns.version(x, w, margin);
      for (const e of entries) {
        if (e.x === x && e.w === w && e.h === h && e.margin === margin && e.from === from && e.to === to && e.version === version) return e.runs;
      }
      if (entries.length < size) entries.push({ x, w, h, margin, from, to, version, runs: blockedRuns() });
      const e = entries[next]!;
      next = (next + 1) % size;
      Object.assign(e, { x, w, h, margin, from, to, version });
      columns.blocked(x, w, h, margin, from, to, e.runs);
      return e.runs;
    },
  };
}
