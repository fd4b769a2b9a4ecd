import type { Species } from '../model/schema.ts';
import { ensembleFreeEnergyJ } from '../thermo/ensemble.ts';
import { conformerWeights } from './conformerWeights.ts';
import { neatSolventCorrectionJ, standardStateCorrectionJ } from '../thermo/standardState.ts';
import type { ResolveContext } from './context.ts';
import { structureEnergiesJ } from './structureEnergy.ts';

export { DEFAULT_CORRECTION_T } from './structureEnergy.ts';

/** Neat water, mol/L: common practice (55.34 M from the density at 25 °C also appears). */
export const DEFAULT_NEAT_CONCENTRATION = 55.5;

/** One species' energy in the profile's quantity, J/mol, or why it cannot be had. */
export type SpeciesEnergy =
  | { ok: true; valueJ: number; notes: string[]; rescaled: boolean; weightsFromOwnQuantity?: boolean }
  | { ok: false; missing: string };

/** Standard-state shift for one species, J/mol (G only). */
function standardStateShiftJ(species: Species, ctx: ResolveContext): { shiftJ: number; note?: string } {
  if (ctx.quantity !== 'G' || ctx.standardState === 'as-computed') return { shiftJ: 0 };
  if (species.phase === 'gas' || species.phase === 'none') return { shiftJ: 0 };
  const from = ctx.standardState === '1atm-to-1M' ? '1atm' : '1bar';
  const gasToSolution = standardStateCorrectionJ(ctx.temperatureK, from);
  if (species.phase === 'solute') return { shiftJ: gasToSolution };
  const c = species.neatConcentration ?? DEFAULT_NEAT_CONCENTRATION;
  return { shiftJ: gasToSolution + neatSolventCorrectionJ(ctx.temperatureK, c), note: `neat ${c} mol/L` };
}

/**
 * Energy of one species in the profile's quantity at its temperature and standard state:
 * E (or single point) + thermal correction, a Boltzmann ensemble over conformers
 * (G_eff = −RT ln Σ exp(−G_i/RT); for H or E the population average Σ p_i(G) X_i with the
 * populations from G, or from X itself only when G data are missing — flagged), plus the
 * standard-state correction per species.
 */
export function speciesEnergy(species: Species, ctx: ResolveContext): SpeciesEnergy {
  if (species.structures.length === 0) return { ok: false, missing: 'no absolute energies' };
  const energies = structureEnergiesJ(species, ctx.quantity, ctx.temperatureK);
  if (!energies.ok) return { ok: false, missing: energies.missing };
  const { valuesJ: values, rescaled } = energies;
  const notes: string[] = [];
  let valueJ = values[0]!;
  let weightsFromOwnQuantity = false;
  if (values.length > 1) {
    const weights = conformerWeights(species, ctx.quantity, ctx.temperatureK);
    if (!weights.ok) return { ok: false, missing: weights.missing };
    const { populations, basis } = weights;
    weightsFromOwnQuantity = ctx.quantity !== 'G' && basis !== 'G';
    valueJ = ctx.quantity === 'G'
      ? ensembleFreeEnergyJ(values, ctx.temperatureK)
      : values.reduce((sum, v, i) => sum + v * populations[i]!, 0);
    const average = ctx.quantity === 'G' ? '' : `, ${ctx.quantity} = Σ pᵢ ${ctx.quantity}ᵢ`;
    notes.push(`${values.length} conformers, populations from ${basis} ${populations.map((p) => `${(100 * p).toFixed(1)}%`).join(' / ')}${average}`);
  }
  const shift = standardStateShiftJ(species, ctx);
  if (shift.note) notes.push(shift.note);
  return { ok: true, valueJ: valueJ + shift.shiftJ, notes, rescaled, ...(weightsFromOwnQuantity ? { weightsFromOwnQuantity } : {}) };
}
