import type { Quantity, Settings, Species } from '../model/schema.ts';
import { ensemblePopulations } from '../thermo/ensemble.ts';
import { structureEnergiesJ } from './structureEnergy.ts';

/**
 * Each conformer's share of its species' Boltzmann ensemble, with the energy it was
 * weighted by (the document's quantity at the document's temperature), or why it cannot be had.
 */
export type ConformerPopulations =
  | { ok: true; populations: number[]; quantity: Quantity; temperatureK: number; rescaled: boolean }
  | { ok: false; quantity: Quantity; temperatureK: number; message: string };

/**
 * Boltzmann populations p_i = exp(−(G_i − G_eff)/RT) of a species' conformers, from the same
 * per-conformer energies and ensemble the profile resolves the species with (so the table
 * and the figure agree); `rescaled` says G was carried from the corrections' temperature.
 */
export function conformerPopulations(species: Species, settings: Pick<Settings, 'quantity' | 'temperatureK'>): ConformerPopulations {
  const { quantity, temperatureK } = settings;
  if (species.structures.length === 0) return { ok: false, quantity, temperatureK, message: 'no conformers' };
  const energies = structureEnergiesJ(species, quantity, temperatureK);
  if (!energies.ok) return { ok: false, quantity, temperatureK, message: `conformer ${energies.index + 1} has ${energies.missing}` };
  return { ok: true, populations: ensemblePopulations(energies.valuesJ, temperatureK), quantity, temperatureK, rescaled: energies.rescaled };
}
