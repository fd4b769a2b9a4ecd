import type { Document, Species, SpeciesTerm } from '../model/schema.ts';
import type { ResolveContext } from './context.ts';

/**
 * How a formation-scale Gibbs energy is formed. `dH-TS`: Σ count (ΔfH° − T·S°) at the
 * document's temperature, which differences into ΔrG° = ΔrH° − TΔrS° for any mass-balanced
 * pair of states (the element entropies cancel), as `passline thermo` computes it; `dfG`:
 * Σ count ΔfG°, valid at the table temperature only. One route per document, so G(T) and
 * K(T) are continuous across 298.15 K.
 */
export type FormationRoute = 'dH-TS' | 'dfG';

/** The formation value used for a quantity: ΔfG° for G, ΔfH° for H; E has none. */
export function formationKey(ctx: ResolveContext): 'dfG' | 'dfH' | null {
  return ctx.quantity === 'G' ? 'dfG' : ctx.quantity === 'H' ? 'dfH' : null;
}

/**
 * The document's formation route: ΔfH° − T·S° when every species its formation-data states
 * name has both ΔfH° and S°, else ΣΔfG°.
 */
export function formationRoute(doc: Document): FormationRoute {
  const byId = new Map(doc.species.map((s) => [s.id, s]));
  const used: Species[] = [];
  for (const p of doc.pathways) for (const q of p.points) {
    if (q.energy.mode === 'formation') for (const t of q.energy.terms) { const s = byId.get(t.species); if (s) used.push(s); }
  }
  return used.every((s) => s.formation?.dfH !== undefined && s.formation?.S !== undefined) ? 'dH-TS' : 'dfG';
}

function termValueJ(species: Species, ctx: ResolveContext): number | undefined {
  const f = species.formation;
  if (ctx.quantity === 'H') return f?.dfH === undefined ? undefined : f.dfH * 1000;
  if (ctx.quantity !== 'G') return undefined;
  if (ctx.formationRoute === 'dH-TS') return f?.dfH === undefined || f.S === undefined ? undefined : f.dfH * 1000 - ctx.temperatureK * f.S;
  return f?.dfG === undefined ? undefined : f.dfG * 1000;
}

/** Σ count × (formation value by the document's route) in J/mol, or the label of the first species that lacks it. */
export function formationSumJ(terms: readonly SpeciesTerm[], ctx: ResolveContext): { ok: true; valueJ: number } | { ok: false; missing: string } {
  let total = 0;
  for (const term of terms) {
    const species = ctx.species.get(term.species)!;
    const value = termValueJ(species, ctx);
    if (value === undefined) return { ok: false, missing: species.label };
    total += term.count * value;
  }
  return { ok: true, valueJ: total };
}
