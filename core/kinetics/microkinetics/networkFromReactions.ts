import type { MassActionNetwork, MassActionReaction, SpeciesCount } from './network.ts';

/** One reaction as a user writes it: `{ A: 1, B: 1 }` ⇌ `{ C: 1 }`, kf and optional kr. */
export interface ReactionInput {
  label?: string;
  reactants: Record<string, number>;
  products: Record<string, number>;
  /** Forward rate constant, (mol/L)^(1−m) s⁻¹ for m reactant molecules. */
  kf: number;
  /** Reverse rate constant (default 0: irreversible). */
  kr?: number;
}

/** Where a network input is wrong, in `reactions[2].kf` form. */
export interface NetworkError {
  path: string;
  message: string;
}

/** A network, or every problem found in the input. */
export type NetworkResult = { ok: true; network: MassActionNetwork } | { ok: false; errors: NetworkError[] };

/** Largest molecularity accepted: termolecular steps are already rare (common practice). */
const MAX_MOLECULARITY = 3;

function side(counts: Record<string, number>, path: string, errors: NetworkError[]): SpeciesCount[] {
  const out: SpeciesCount[] = [];
  let total = 0;
  for (const [species, count] of Object.entries(counts)) {
    if (species.trim() === '') errors.push({ path, message: 'a species name is empty' });
    else if (!Number.isInteger(count) || count < 1) errors.push({ path: `${path}.${species}`, message: `stoichiometric coefficient must be a positive whole number, got ${count}` });
    else { out.push({ species, count }); total += count; }
  }
  if (total > MAX_MOLECULARITY) errors.push({ path, message: `molecularity ${total} is above ${MAX_MOLECULARITY}; split the step into elementary steps` });
  return out;
}

function checkConstant(value: number | undefined, path: string, errors: NetworkError[]): number {
  if (value === undefined) return 0;
  if (!Number.isFinite(value) || value < 0) errors.push({ path, message: `rate constant must be a finite number ≥ 0, got ${value}` });
  return value;
}

/**
 * Builds a mass-action network from explicit elementary reactions (A + B ⇌ C, concentrations
 * in mol/L), for when the species of each state are known. Species are taken in order of
 * first appearance unless `species` lists them. Returns every input problem with its path.
 */
export function networkFromReactions(reactions: readonly ReactionInput[], species?: readonly string[]): NetworkResult {
  const errors: NetworkError[] = [];
  const built: MassActionReaction[] = reactions.map((input, r) => {
    const path = `reactions[${r}]`;
    const reactants = side(input.reactants, `${path}.reactants`, errors);
    const products = side(input.products, `${path}.products`, errors);
    if (reactants.length === 0) errors.push({ path: `${path}.reactants`, message: 'a reaction needs at least one reactant' });
    const kf = checkConstant(input.kf, `${path}.kf`, errors);
    const kr = checkConstant(input.kr, `${path}.kr`, errors);
    if (products.length === 0 && kr > 0) errors.push({ path: `${path}.kr`, message: 'a reverse rate needs at least one product' });
    return { label: input.label ?? `step ${r + 1}`, reactants, products, kf, kr };
  });
  if (reactions.length === 0) errors.push({ path: 'reactions', message: 'no reactions given' });
  const seen = [...new Set(built.flatMap((r) => [...r.reactants, ...r.products].map((s) => s.species)))];
  const names = species ? [...species] : seen;
  for (const s of seen) if (!names.includes(s)) errors.push({ path: 'species', message: `species "${s}" is used in a reaction but not listed` });
  if (new Set(names).size !== names.length) errors.push({ path: 'species', message: 'a species is listed twice' });
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, network: { species: names, labels: names, reactions: built } };
}
