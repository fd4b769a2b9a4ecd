import { describe, expect, it } from 'vitest';
import { networkFromReactions } from '../../../../core/kinetics/microkinetics/index.ts';

describe('networkFromReactions', () => {
  it('lists species in order of first appearance, with default labels and kr = 0', () => {
    const r = networkFromReactions([{ reactants: { A: 1, B: 1 }, products: { C: 1 }, kf: 5 }, { reactants: { C: 1 }, products: { D: 1 }, kf: 0.1 }]);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.network.species).toEqual(['A', 'B', 'C', 'D']);
    expect(r.network.reactions[1]).toMatchObject({ label: 'step 2', kr: 0, reactants: [{ species: 'C', count: 1 }] });
  });

  it('names the path of each bad entry', () => {
    const r = networkFromReactions([
      { reactants: { A: 1.5 }, products: { B: 1 }, kf: 1 },
      { reactants: { A: 2, B: 2 }, products: {}, kf: -1, kr: 2 },
    ]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const paths = r.errors.map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['reactions[0].reactants.A', 'reactions[1].reactants', 'reactions[1].kf', 'reactions[1].kr']));
    expect(r.errors.find((e) => e.path === 'reactions[1].reactants')!.message).toMatch(/molecularity 4/);
  });

  it('checks an explicit species list against the reactions', () => {
    const r = networkFromReactions([{ reactants: { A: 1 }, products: { B: 1 }, kf: 1 }], ['A']);
    expect(!r.ok && r.errors[0]!.message).toMatch(/"B" is used/);
  });

  it('rejects an empty reaction list', () => {
    expect(networkFromReactions([]).ok).toBe(false);
  });
});
