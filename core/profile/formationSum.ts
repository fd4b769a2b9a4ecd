import type { SpeciesTerm } from '../model/schema.ts';
import type { ResolveContext } from './context.ts';

/** The formation value used for a quantity: ΔfG° for G, ΔfH° for H; E has none. */
export function formationKey(ctx: ResolveContext): 'dfG' | 'dfH' | null {
  return ctx.quantity === 'G' ? 'dfG' : ctx.quantity === 'H' ? 'dfH' : null;
}

/** Σ count × ΔfX° in J/mol, or the label of the first species that lacks the value. */
export function formationSumJ(terms: readonly SpeciesTerm[], ctx: ResolveContext): { ok: true; valueJ: number } | { ok: false; missing: string } {
  const key = formationKey(ctx);
  let total = 0;
  for (const term of terms) {
    const species = ctx.species.get(term.species)!;
    const value = key ? species.formation?.[key] : undefined;
    if (value === undefined) return { ok: false, missing: species.label };
    total += term.count * value * 1000;
  }
  return { ok: true, valueJ: total };
}
