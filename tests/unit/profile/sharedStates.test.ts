import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import type { DocumentInput } from '../../../core/model/schema.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { typed } from './builders.ts';

type PathwayInput = NonNullable<DocumentInput['pathways']>[number];

const mismatches = (pathways: PathwayInput[], rest: Omit<DocumentInput, 'format' | 'version' | 'pathways'> = {}) =>
  resolveProfile(makeDocument({ ...rest, pathways })).findings.filter((f) => f.code === 'shared-state-mismatch');

/** Pathway k (1-based) from S through its own TS to the shared states, energies in kcal/mol. */
const pathway = (k: number, shared: Record<string, number>, start = 'S'): PathwayInput => ({
  id: `p${k}`, name: `pathway ${k}`,
  points: [typed(start, 'min', 0), typed(`TS-${k}`, 'ts', 20 + k), ...Object.entries(shared).map(([label, kcal]) => typed(label, 'min', kcal))],
});

describe('shared states across pathways', () => {
  // The tolerance is 0.01 kcal/mol (common practice: below a reported digit).
  it('ten pathways give one finding per state drawn at several energies, none for states that agree', () => {
    const i2 = [5, 5, 5, 5, 6, 6, 6, 7, 8, 8];
    const pathways = i2.map((e, n) => pathway(n + 1, { I1: -3 + (n % 2) * 0.005, I2: e, I3: n === 6 ? -12 : -10, P: -20 }));
    const found = mismatches(pathways);
    expect(found).toEqual([
      {
        severity: 'warning', code: 'shared-state-mismatch', pathway: 'p5', point: 'I2',
        message: '"I2" has 4 different energies across pathways: 5.0 kcal mol⁻¹ in "pathway 1", 6.0 kcal mol⁻¹ in "pathway 5", 7.0 kcal mol⁻¹ in "pathway 8", 8.0 kcal mol⁻¹ in "pathway 9"',
      },
      {
        severity: 'warning', code: 'shared-state-mismatch', pathway: 'p7', point: 'I3',
        message: '"I3" has 2 different energies across pathways: -10.0 kcal mol⁻¹ in "pathway 1", -12.0 kcal mol⁻¹ in "pathway 7"',
      },
    ]);
  });

  it('a long list of energies is cut after six with the number left out', () => {
    const found = mismatches([1, 2, 3, 4, 5, 6, 7, 8].map((k) => pathway(k, { P: -k })));
    expect(found).toHaveLength(1);
    expect(found[0]!.message).toBe('"P" has 8 different energies across pathways: -1.0 kcal mol⁻¹ in "pathway 1", -2.0 kcal mol⁻¹ in "pathway 2", -3.0 kcal mol⁻¹ in "pathway 3", '
      + '-4.0 kcal mol⁻¹ in "pathway 4", -5.0 kcal mol⁻¹ in "pathway 5", -6.0 kcal mol⁻¹ in "pathway 6", and 2 more');
    expect(found[0]!.pathway).toBe('p2');
  });

  it('energies follow the document unit and decimals', () => {
    const found = mismatches([pathway(1, { P: -7 }), pathway(2, { P: -6 })], { settings: { unit: 'kJ/mol', decimals: 2 } });
    // 1 kcal = 4.184 kJ (thermochemical calorie, NIST SP 811).
    expect(found[0]!.message).toBe('"P" has 2 different energies across pathways: -29.29 kJ mol⁻¹ in "pathway 1", -25.10 kJ mol⁻¹ in "pathway 2"');
  });

  it('pathways with their own first point are compared only with pathways starting at the same state', () => {
    const pathways = [pathway(1, { P: -7 }), pathway(2, { P: -7 }), pathway(3, { P: -2 }, 'S2'), pathway(4, { P: -3 }, 'S2')];
    const found = mismatches(pathways);
    expect(found.map((f) => [f.pathway, f.message])).toEqual([['p4', '"P" has 2 different energies across pathways: -2.0 kcal mol⁻¹ in "pathway 3", -3.0 kcal mol⁻¹ in "pathway 4"']]);
  });

  it('with a shared reference point every pathway is compared', () => {
    const pathways = [pathway(1, { P: -7 }), pathway(2, { P: -2 }, 'S2')];
    expect(mismatches(pathways)).toEqual([]);
    const found = mismatches(pathways, { settings: { reference: { kind: 'point', pathway: 'p1', point: 'S' } } });
    expect(found.map((f) => f.point)).toEqual(['P']);
  });

  it('a repeat within one pathway is not a disagreement between pathways (a cycle returns lower)', () => {
    const cycle = (k: number, end: number): PathwayInput => ({
      id: `c${k}`, name: `cycle ${k}`, cycle: true,
      points: [typed('Cat', 'min', 0), typed(`TS-${k}`, 'ts', 15), typed('I', 'min', -2), typed(`TS2-${k}`, 'ts', 10), typed('Cat', 'min', end, { id: `Cat-end-${k}` })],
    });
    expect(mismatches([cycle(1, -5), cycle(2, -6)])).toEqual([]);
  });
});
