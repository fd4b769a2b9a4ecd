import { describe, expect, it } from 'vitest';
import { compileNetwork, networkFromReactions, type ReactionInput } from '../../../../core/kinetics/microkinetics/index.ts';

function build(reactions: ReactionInput[]) {
  const r = networkFromReactions(reactions);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.network;
}

describe('compileNetwork', () => {
  // Robertson (1966) as mass action: A → B (0.04), B + C → A + C (1e4), 2B → B + C (3e7);
  // its rate law as printed in Hairer & Wanner II, Sec. IV.1 (from memory).
  it('turns the Robertson reactions into the printed rate law', () => {
    const net = compileNetwork(build([
      { reactants: { A: 1 }, products: { B: 1 }, kf: 0.04 },
      { reactants: { B: 1, C: 1 }, products: { A: 1, C: 1 }, kf: 1e4 },
      { reactants: { B: 2 }, products: { B: 1, C: 1 }, kf: 3e7 },
    ]));
    const y = Float64Array.from([0.7, 2e-5, 0.3]);
    const d = new Float64Array(3);
    net.rhs(y, d);
    const expected = [-0.04 * 0.7 + 1e4 * 2e-5 * 0.3, 0.04 * 0.7 - 1e4 * 2e-5 * 0.3 - 3e7 * 4e-10, 3e7 * 4e-10];
    expected.forEach((v, i) => expect(d[i]! / v).toBeCloseTo(1, 12));
  });

  // Jacobian check by central differences, error O(δ²) (common practice).
  it('gives the exact Jacobian of a bimolecular, reversible network with a tally', () => {
    const network = build([
      { reactants: { A: 1, B: 1 }, products: { C: 1 }, kf: 3.2, kr: 0.7 },
      { reactants: { C: 2 }, products: { D: 1, A: 1 }, kf: 1.5, kr: 0.4 },
    ]);
    network.turnoverReaction = 1;
    const net = compileNetwork(network);
    expect(net.size).toBe(5);
    const y = Float64Array.from([0.4, 0.9, 0.25, 0.1, 0]);
    const jac = new Float64Array(25);
    net.jacobian(y, jac);
    for (let j = 0; j < 5; j++) {
      const up = Float64Array.from(y); const down = Float64Array.from(y);
      const delta = 1e-6;
      up[j]! += delta; down[j]! -= delta;
      const fu = new Float64Array(5); const fd = new Float64Array(5);
      net.rhs(up, fu); net.rhs(down, fd);
      for (let i = 0; i < 5; i++) expect(jac[i * 5 + j]).toBeCloseTo((fu[i]! - fd[i]!) / (2 * delta), 8);
    }
  });

  it('counts the net extent of the turnover reaction in the tally', () => {
    const network = build([{ reactants: { X: 1 }, products: { Y: 1 }, kf: 2, kr: 0.5 }]);
    network.turnoverReaction = 0;
    const net = compileNetwork(network);
    const d = new Float64Array(3);
    net.rhs(Float64Array.from([1, 1, 0]), d);
    expect(Array.from(d)).toEqual([-1.5, 1.5, 1.5]);
    expect(net.netRate(0, Float64Array.from([1, 1, 0]))).toBe(1.5);
  });
});
