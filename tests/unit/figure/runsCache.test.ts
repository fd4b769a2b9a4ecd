import { describe, expect, it } from 'vitest';
import { blockedRuns, columnIndex, type BlockedRuns } from '../../../core/figure/columnIndex.ts';
import { runsCache } from '../../../core/figure/runsCache.ts';

const list = (r: BlockedRuns) => Array.from({ length: r.n }, (_, k) => [r.lo[k], r.hi[k]]);

describe('runsCache', () => {
  it('gives the runs a fresh column search gives, before and after a box lands in the column', () => {
    const columns = columnIndex(4);
    columns.add({ x: 1, y: 10, w: 3, h: 1 });
    columns.add({ x: 2, y: 30, w: 3, h: 1 });
    const cache = runsCache(columns, 2);
    const fresh = () => {
      const out = blockedRuns();
      columns.blocked(0, 5, 2, 0.5, 0, 100, out);
      return list(out);
    };
    // Box at 10..11, label 2 high, margin 0.5: tops in (7.5, 11.5) are blocked.
    expect(list(cache.get(0, 5, 2, 0.5, 0, 100))).toEqual([[7.5, 11.5], [27.5, 31.5]]);
    expect(list(cache.get(0, 5, 2, 0.5, 0, 100))).toEqual(fresh());
    columns.add({ x: 0, y: 50, w: 2, h: 1 });
    expect(list(cache.get(0, 5, 2, 0.5, 0, 100))).toEqual([[7.5, 11.5], [27.5, 31.5], [47.5, 51.5]]);
    // A box in a strip the column does not read leaves the runs as they were.
    columns.add({ x: 40, y: 20, w: 2, h: 1 });
    expect(list(cache.get(0, 5, 2, 0.5, 0, 100))).toEqual(fresh());
  });

  it('keeps columns of other widths and places apart', () => {
    const columns = columnIndex(4);
    columns.add({ x: 1, y: 10, w: 3, h: 1 });
    columns.add({ x: 9, y: 20, w: 2, h: 1 });
    const cache = runsCache(columns, 2);
    expect(list(cache.get(0, 5, 2, 0, 0, 100))).toEqual([[8, 11]]);
    expect(list(cache.get(8, 4, 2, 0, 0, 100))).toEqual([[18, 21]]);
    expect(list(cache.get(0, 5, 3, 0, 0, 100))).toEqual([[7, 11]]);
    expect(list(cache.get(0, 5, 2, 0, 0, 100))).toEqual([[8, 11]]);
  });
});
