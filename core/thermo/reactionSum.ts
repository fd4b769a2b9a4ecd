import type { FormationData, FormationKey } from './formationValues.ts';
import { netStoichiometry, type Reaction } from './reaction.ts';

/** Result of {@link reactionSum}: the sum, or the species that block it. */
export type ReactionSumResult =
  | { ok: true; value: number }
  | { ok: false; unknown: string[]; missing: string[] };

/**
 * Hess's law: Δr X° = Σ ν_i X°_i (products +, reactants −), in the units of the table
 * (Hess 1840; REFERENCE.md §4). `unknown` lists species absent from the data, `missing`
 * those present without this value.
 */
export function reactionSum(reaction: Reaction, data: FormationData, key: FormationKey): ReactionSumResult {
  let value = 0;
  const unknown: string[] = [];
  const missing: string[] = [];
  for (const [species, nu] of netStoichiometry(reaction)) {
    const entry = data.get(species);
    if (entry === undefined) unknown.push(species);
    else {
      const x = entry[key];
      if (x === undefined) missing.push(species);
      else value += nu * x;
    }
  }
  return unknown.length > 0 || missing.length > 0 ? { ok: false, unknown, missing } : { ok: true, value };
}
