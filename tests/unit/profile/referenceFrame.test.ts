import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import { makeDocument, parseDocument } from '../../../core/model/load.ts';
import { kcalToHartree, species, state, typed } from './builders.ts';

const kcalOf = (j: number | null) => (j === null ? null : j / 4184);

// Two routes from different starting states, typed on one common zero: TS 15.0 and 16.0.
const twoRoutes = (settings = {}) => makeDocument({
  settings,
  pathways: [
    { id: 'a', name: 'A', points: [typed('R', 'min', 0), typed('TSa', 'ts', 15), typed('Pa', 'min', -5)] },
    { id: 'b', name: 'B', points: [typed('R2', 'min', 1.5), typed('TSb', 'ts', 16), typed('Pb', 'min', -3)] },
  ],
  comparisons: [{ type: 'selectivity', pathways: ['a', 'b'] }],
});

describe('the document-wide zero', () => {
  it('selectivity between pathways from different states uses the common scale: ΔΔG‡ = 1.0 kcal/mol → 84.39354867 % (REFERENCE.md §8)', () => {
    const c = analyseDocument(twoRoutes()).comparisons[0]!;
    if (c.type !== 'selectivity' || !c.result) throw new Error('no selectivity');
    expect(c.result.channels[0]!.percent).toBeCloseTo(84.39354867, 7);
  });

  it('the old per-pathway zero refuses the same comparison with a finding that says why', () => {
    const a = analyseDocument(twoRoutes({ reference: { kind: 'first' } }));
    const c = a.comparisons[0]!;
    expect(c.type === 'selectivity' && c.result).toBe(null);
    expect(a.findings.find((f) => f.code === 'no-common-scale')?.message).toContain('not measured from one zero');
  });

  it('species sums are relative to the document\'s first species state, shared by every pathway; the reference is stated', () => {
    const doc = makeDocument({
      species: [species('A', -1000), species('B', -995), species('T1', -980), species('T2', -978), species('C', -1010)],
      pathways: [
        { id: 'p', name: 'P', points: [state('A', 'min', [['A', 1]]), state('T1', 'ts', [['T1', 1]]), state('C', 'min', [['C', 1]])] },
        { id: 'q', name: 'Q', points: [state('B', 'min', [['B', 1]]), state('T2', 'ts', [['T2', 1]]), state('C2', 'min', [['C', 1]])] },
      ],
    });
    const profile = resolveProfile(doc);
    expect(profile.pathways[1]!.points.map((p) => kcalOf(p.energyJ)!)).toEqual([5, 22, -10].map((v) => expect.closeTo(v, 9) as unknown as number));
    expect(profile.pathways[0]!.scaleKey).toBe(profile.pathways[1]!.scaleKey);
    expect(profile.reference?.text).toContain('species sums relative to "A" (P)');
  });

  it('a species-sum reference is shared by all pathways, and typed values stay as typed', () => {
    const doc = makeDocument({
      settings: { reference: { kind: 'species', terms: [{ species: 'A', count: 1 }] } },
      species: [species('A', -1000), species('B', -995)],
      pathways: [{ id: 'p', name: 'P', points: [state('B', 'min', [['B', 1]]), typed('T', 'ts', 20)] }],
    });
    const profile = resolveProfile(doc);
    // B − A = +5 kcal/mol (built from hartree with CODATA 2018 627.5094740630558 kcal/mol per Eh).
    expect(kcalOf(profile.pathways[0]!.points[0]!.energyJ)).toBeCloseTo(5, 9);
    void kcalToHartree;
  });

  it('a branching pathway starts at the energy of the point it branches from', () => {
    const doc = makeDocument({
      pathways: [
        { id: 'main', name: 'Main', points: [typed('R', 'min', 0), typed('TS1', 'ts', 12), typed('I', 'min', -4)] },
        { id: 'side', name: 'Side', branch: { pathway: 'main', point: 'I' }, points: [typed('I', 'min', 0), typed('TS2', 'ts', 10), typed('Q', 'min', -2)] },
      ],
    });
    const profile = resolveProfile(doc);
    expect(profile.pathways[1]!.points.map((p) => kcalOf(p.energyJ))).toEqual([-4, 6, -6]);
    expect(profile.pathways[1]!.scaleKey).toBe(profile.pathways[0]!.scaleKey);
  });

  it('a branch loop is a finding, not a crash', () => {
    const doc = makeDocument({
      pathways: [
        { id: 'x', name: 'X', branch: { pathway: 'y', point: 'b' }, points: [typed('a', 'min', 0)] },
        { id: 'y', name: 'Y', branch: { pathway: 'x', point: 'a' }, points: [typed('b', 'min', 0)] },
      ],
    });
    expect(resolveProfile(doc).findings.map((f) => f.code)).toContain('branch-loop');
  });

  it('a format-2 document with a shared reference point keeps it', () => {
    const r = parseDocument(JSON.stringify({ format: 'passline', version: 2, settings: { reference: { kind: 'point', pathway: 'a', point: 'R' } }, pathways: [{ id: 'a', name: 'A', points: [typed('R', 'min', 2)] }] }));
    expect(r.ok && r.doc.settings.reference).toEqual({ kind: 'point', pathway: 'a', point: 'R' });
  });
});
