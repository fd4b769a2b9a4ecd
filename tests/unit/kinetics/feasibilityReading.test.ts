import { describe, expect, it } from 'vitest';
import { feasibilityReading } from '../../../core/kinetics/index.ts';
import { kcal, rel } from './build.ts';

const T = 298.15;

describe('feasibilityReading', () => {
  it('reports the first-order half-life the barrier implies', () => {
    // REFERENCE.md §2 worked checks (Eyring 1935): 23 kcal/mol → t½ = 8066.41175461 s at 298.15 K.
    const r = feasibilityReading(kcal(23), T);
    expect(rel(r.halfLifeSeconds, 8066.41175461)).toBeLessThan(1e-9);
    expect(r.basis).toMatch(/^common practice/);
  });

  // Band edges sit on the half-lives of REFERENCE.md §2's inverse table (1 s ↔ 17.67032295,
  // 1 min ↔ 20.09616048, 8 h ↔ 23.75403583, 1 week ↔ 25.55786956 kcal/mol); the bands
  // themselves are the common-practice rule of thumb of §2.
  const cases: [number, string][] = [
    [15, 'sub-second'],
    [17.66, 'sub-second'],
    [17.68, 'seconds to minutes'],
    [20.09, 'seconds to minutes'],
    [20.1, 'minutes to hours'],
    [23, 'minutes to hours'],
    [23.75, 'minutes to hours'],
    [23.76, 'hours to days'],
    [25.55, 'hours to days'],
    [25.56, 'needs heating or days'],
    [30, 'needs heating or days'],
  ];
  for (const [barrier, band] of cases) {
    it(`reads ${barrier} kcal/mol at 298.15 K as ${band}`, () => {
      expect(feasibilityReading(kcal(barrier), T).band).toBe(band);
    });
  }

  it('moves a band with temperature', () => {
    // REFERENCE.md §2 rule of thumb (common practice): ≳ 25 kcal/mol needs heating; at 373.15 K it runs in minutes to hours.
    expect(feasibilityReading(kcal(27), T).band).toBe('needs heating or days');
    expect(feasibilityReading(kcal(27), 373.15).band).toBe('minutes to hours');
  });
});
