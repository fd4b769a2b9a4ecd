/** One species taking part in a reaction, `count` times (its stoichiometric coefficient). */
export interface SpeciesCount {
  species: string;
  count: number;
}

/**
 * An elementary reversible step under mass action: forward rate kf·Π[reactant]^count,
 * reverse rate kr·Π[product]^count (Guldberg–Waage law of mass action; for an elementary
 * step the orders equal the stoichiometric coefficients, IUPAC Gold Book "order of
 * reaction", doi:10.1351/goldbook.O04322 [from memory]). Units: concentrations in mol/L,
 * kf in (mol/L)^(1−m) s⁻¹ for m reactant molecules, likewise kr for the products.
 */
export interface MassActionReaction {
  label: string;
  reactants: SpeciesCount[];
  products: SpeciesCount[];
  kf: number;
  kr: number;
}

/** A reaction network: species (ids), labels for display, reactions, and cycle bookkeeping. */
export interface MassActionNetwork {
  species: string[];
  /** Display names, same order as `species`. */
  labels: string[];
  reactions: MassActionReaction[];
  /** Species forming a catalytic cycle; their summed concentration is the catalyst total. */
  catalyst?: string[];
  /** Index of the reaction that closes the cycle; its net extent counts turnovers. */
  turnoverReaction?: number;
}
