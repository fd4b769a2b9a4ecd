import type { Quantity, Settings, Species } from '../model/schema.ts';
import { conformerWeights } from './conformerWeights.ts';

/**
 * Each conformer's share of its species' Boltzmann ensemble, with the energy it was
 * weighted by (the document's quantity at the document's temperature), or why it cannot be had.
 */
export type ConformerPopulations =
  | { ok: true; populations: number[]; quantity: Quantity; temperatureK: number; rescaled: boolean; basis: Quantity }
  | { ok: false; quantity: Quantity; temperatureK: number; message: string };

/**
 * Boltzmann populations p_i = exp(−(G_i − G_eff)/RT) of a species' conformers, the same
 * weights the profile resolves the species with (so the table and the figure agree): from G
 * whatever the quantity, from the quantity itself only without G data (`basis`); `rescaled`
 * says G was carried from the corrections' temperature.
 */
export function conformerPopulations(species: Species, settings: Pick<Settings, 'quantity' | 'temperatureK'>): ConformerPopulations {
  const { quantity, temperatureK } = settings;
  if (species.structures.length === 0) return { ok: false, quantity, temperatureK, message: 'no conformers' };
  const w = conformerWeights(species, quantity, temperatureK);
  if (!w.ok) return { ok: false, quantity, temperatureK, message: `conformer ${w.index + 1} has ${w.missing}` };
  return { ok: true, populations: w.populations, quantity: w.basis, temperatureK, rescaled: w.rescaled, basis: w.basis };
}
