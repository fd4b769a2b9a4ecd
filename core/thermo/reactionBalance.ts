import { compareCompositions, describeComparison, sumCompositions, type CompositionComparison } from './composition.ts';
import { parseFormula, type ParsedFormula } from './formula.ts';
import type { Reaction, ReactionTerm } from './reaction.ts';

/** Result of {@link checkReactionBalance}. */
export type BalanceResult =
  | { ok: true }
  | { ok: false; message: string; comparison?: CompositionComparison };

/**
 * Checks that a reaction conserves every element and the charge, reading each species name
 * (formula + phase) with {@link parseFormula}. The message names the species whose formula
 * cannot be read, or the imbalance: "unbalanced: 2 more O on the right".
 */
export function checkReactionBalance(reaction: Reaction): BalanceResult {
  const side = (terms: readonly ReactionTerm[]): { formula: ParsedFormula; count: number }[] | string => {
    const out: { formula: ParsedFormula; count: number }[] = [];
    for (const term of terms) {
      const parsed = parseFormula(term.species);
      if (!parsed.ok) return `cannot read the formula of species '${term.species}': ${parsed.error.message}`;
      out.push({ formula: parsed.value, count: term.coefficient });
    }
    return out;
  };
  const left = side(reaction.reactants);
  if (typeof left === 'string') return { ok: false, message: left };
  const right = side(reaction.products);
  if (typeof right === 'string') return { ok: false, message: right };
  const comparison = compareCompositions(sumCompositions(right), sumCompositions(left));
  if (comparison.equal) return { ok: true };
  return { ok: false, message: `unbalanced: ${describeComparison(comparison)} on the right`, comparison };
}
