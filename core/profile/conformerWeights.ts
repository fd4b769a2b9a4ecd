import type { Quantity, Species } from '../model/schema.ts';
import { ensemblePopulations } from '../thermo/ensemble.ts';
import { structureEnergiesJ } from './structureEnergy.ts';

/** Boltzmann weights of a species' conformers and the energy they come from. */
export type ConformerWeights =
  | { ok: true; populations: number[]; basis: Quantity; rescaled: boolean }
  | { ok: false; index: number; missing: string };

/**
 * Equilibrium populations of a species' conformers: p_i = exp(−(G_i − G_eff)/RT) from their
 * Gibbs energies whatever the profile's quantity, because populations are set by G
 * (Boltzmann distribution; e.g. McQuarrie, Statistical Mechanics (1976)). Without G data for
 * every conformer the profile's own quantity stands in (`basis` says which; callers add a
 * finding for that fallback).
 */
export function conformerWeights(species: Species, quantity: Quantity, temperatureK: number): ConformerWeights {
  const g = structureEnergiesJ(species, 'G', temperatureK);
  if (g.ok) return { ok: true, populations: ensemblePopulations(g.valuesJ, temperatureK), basis: 'G', rescaled: g.rescaled };
  if (quantity === 'G') return g;
  const own = structureEnergiesJ(species, quantity, temperatureK);
  if (!own.ok) return own;
  return { ok: true, populations: ensemblePopulations(own.valuesJ, temperatureK), basis: quantity, rescaled: own.rescaled };
}
