import { describe, expect, it } from 'vitest';
import { quantile } from 'd3';
import { frequencies, summarise } from '../../../core/uncertainty/summarise.ts';

describe('summarise', () => {
  it('agrees with d3.quantile (Hyndman & Fan type 7) on random, tied and odd-sized samples', () => {
    let seed = 12345;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (const n of [1, 2, 3, 10, 41, 1000, 10_001]) {
      for (const tied of [false, true]) {
        const values = Float64Array.from({ length: n }, () => (tied ? Math.floor(next() * 5) : next() * 100 - 50));
        const s = summarise(values.slice())!;
        expect([s.median, s.low, s.high]).toEqual([quantile(values, 0.5), quantile(values, 0.025), quantile(values, 0.975)]);
        expect(s.samples).toBe(n);
      }
    }
  });

  it('leaves out samples where the number could not be computed, and returns null when none could', () => {
    expect(summarise(Float64Array.from([Number.NaN, 3, Infinity, 1, 2]))).toEqual({ median: 2, low: 1.05, high: 2.95, sd: 1, samples: 3 });
    expect(summarise(Float64Array.from([Number.NaN]))).toBeNull();
  });

  it('frequencies are shares of the counted outcomes', () => {
    expect(frequencies(['a', 'b', 'a', null, 'a'])).toEqual({ a: 0.75, b: 0.25 });
  });
});
