import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { networkFromReactions, type MassActionNetwork, type ReactionInput } from '../../../../core/kinetics/microkinetics/index.ts';

/** One problem of tests/fixtures/scipy/microkinetics.json (made by makeMicrokineticsFixture.py). */
export interface FixtureProblem {
  name: string;
  species: string[];
  reactions: ReactionInput[];
  turnoverReaction: number | null;
  initial: number[];
  atol: number;
  times: number[];
  states: number[][];
}

const path = fileURLToPath(new URL('../../../fixtures/scipy/microkinetics.json', import.meta.url));
/** The SciPy reference file: solve_ivp Radau, rtol 1e-10, with the SciPy/NumPy versions used. */
export const scipyFixture = JSON.parse(readFileSync(path, 'utf8')) as {
  scipy: string; numpy: string; method: string; problems: Record<string, FixtureProblem>;
};

/** The fixture problem as a Passline network (tally species excluded, closing step marked). */
export function fixtureNetwork(problem: FixtureProblem): MassActionNetwork {
  const built = networkFromReactions(problem.reactions);
  if (!built.ok) throw new Error(built.errors.map((e) => e.message).join('; '));
  const network = built.network;
  if (problem.turnoverReaction !== null) {
    network.turnoverReaction = problem.turnoverReaction;
    network.catalyst = [...network.species];
  }
  return network;
}

/** Largest |ours − ref| / (rel·|ref| + floor) over all times and components: ≤ 1 passes. */
export function worstMismatch(ours: ArrayLike<number>[], ref: number[][], rel: number, floor: number): number {
  let worst = 0;
  ref.forEach((row, k) => row.forEach((value, i) => {
    worst = Math.max(worst, Math.abs(ours[k]![i]! - value) / (rel * Math.abs(value) + floor));
  }));
  return worst;
}
