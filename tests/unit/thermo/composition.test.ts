import { describe, expect, it } from 'vitest';
import { compareCompositions, describeComparison, hillOrder, sumCompositions } from '../../../core/thermo/index.ts';

describe('sumCompositions', () => {
  it('weights species by their counts, charge included', () => {
    // A state "[Pd] + 2 NH4^+" built by hand: Pd + 2 N + 8 H, charge +2.
    const s = sumCompositions([
      { formula: { counts: { Pd: 1 }, charge: 0 }, count: 1 },
      { formula: { counts: { N: 1, H: 4 }, charge: 1 }, count: 2 },
    ]);
    expect(s).toEqual({ counts: { Pd: 1, N: 2, H: 8 }, charge: 2 });
  });
});

describe('compareCompositions', () => {
  it('reports per-element and charge differences a − b in Hill order', () => {
    const a = { counts: { O: 1, H: 4, C: 1 }, charge: 1 };
    const b = { counts: { H: 2, C: 1, N: 1 }, charge: 0 };
    const d = compareCompositions(a, b);
    expect(d.equal).toBe(false);
    expect(d.differences).toEqual([{ element: 'H', difference: 2 }, { element: 'N', difference: -1 }, { element: 'O', difference: 1 }]);
    expect(d.chargeDifference).toBe(1);
    expect(describeComparison(d)).toBe('2 more H, 1 fewer N, 1 more O, charge 1 higher');
  });

  it('treats float round-off from fractional coefficients as equal', () => {
    const third = sumCompositions([{ formula: { counts: { O: 3 }, charge: 0 }, count: 1 / 3 }, { formula: { counts: { O: 1 }, charge: 0 }, count: 0.1 + 0.2 - 0.3 }]);
    expect(compareCompositions(third, { counts: { O: 1 }, charge: 0 }).equal).toBe(true);
  });
});

describe('hillOrder', () => {
  it('puts C then H first, the rest alphabetical (Hill, J. Am. Chem. Soc. 22, 478 (1900))', () => {
    expect(hillOrder(['O', 'H', 'N', 'C', 'Br'])).toEqual(['C', 'H', 'Br', 'N', 'O']);
  });
});
