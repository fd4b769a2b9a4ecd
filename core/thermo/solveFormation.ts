import { FORMATION_LABELS, type FormationData, type FormationKey } from './formationValues.ts';
import { netStoichiometry, type Reaction } from './reaction.ts';

/** Result of {@link solveFormationValue}: the value in table units, or why it cannot be had. */
export type SolveResult = { ok: true; value: number } | { ok: false; message: string };

/**
 * Back-solves one formation value of one species from a known reaction value by Hess's law:
 * X_s = (Δr X° − Σ_{i≠s} ν_i X_i) / ν_s. `reactionValue` and the result are in table units
 * (kJ/mol for ΔrH°/ΔfH° and ΔrG°/ΔfG°, J/(mol K) for ΔrS°/S°). Other species' values must be known.
 */
export function solveFormationValue(reaction: Reaction, data: FormationData, species: string, key: FormationKey, reactionValue: number): SolveResult {
  const nu = netStoichiometry(reaction);
  const own = nu.get(species);
  if (own === undefined) return { ok: false, message: `species '${species}' is not in the reaction` };
  if (own === 0) return { ok: false, message: `species '${species}' cancels out of the reaction (same amount on both sides)` };
  let rest = 0;
  for (const [name, n] of nu) {
    if (name === species || n === 0) continue;
    const x = data.get(name)?.[key];
    if (x === undefined) {
      const why = data.has(name) ? `has no ${FORMATION_LABELS[key]}` : 'is not in the table';
      return { ok: false, message: `cannot solve for ${species}: species '${name}' ${why}` };
    }
    rest += n * x;
  }
  return { ok: true, value: (reactionValue - rest) / own };
}
