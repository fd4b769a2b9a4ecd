import { describe, expect, it } from 'vitest';
import { energyScale } from '../../../core/figure/energyScale.ts';

describe('energyScale', () => {
  it('maps energies linearly onto the mm range, the domain rounded to tick steps', () => {
    // −25…45 rounded for 5 ticks is −40…60 (steps of 20, d3's nice()); 100 units over 50 mm.
    const s = energyScale([-25, 45], 60, 10, 5);
    expect(s.domain).toEqual([-40, 60]);
    expect(s.y(-40)).toBeCloseTo(60, 12);
    expect(s.y(60)).toBeCloseTo(10, 12);
    expect(s.y(0)).toBeCloseTo(40, 12);
    expect(s.ticks).toEqual([-40, -20, 0, 20, 40, 60]);
  });

  it('thins ticks on a short axis but never to a lone "0"', () => {
    // The same domain over 8 mm with tick numbers 6 mm apart: steps of 20 (1.6 mm) and of 50
    // (4 mm) are too close; one step of 100 would leave only 0. Two ticks stay: 0 and 50.
    const s = energyScale([-25, 45], 18, 10, 5, 6);
    expect(s.ticks).toEqual([0, 50]);
    expect(s.ticks.map(s.format)).toEqual(['0', '50']);
  });
});
