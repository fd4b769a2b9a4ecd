import type { Quantity, Species, Structure } from '../model/schema.ts';
import { ensembleFreeEnergyJ, ensemblePopulations } from '../thermo/ensemble.ts';
import { neatSolventCorrectionJ, standardStateCorrectionJ } from '../thermo/standardState.ts';
import { toJoulesPerMol } from '../units/energy.ts';
import type { ResolveContext } from './context.ts';

/** Temperature assumed for thermal corrections when a species does not say (the usual default of quantum-chemistry programs). */
export const DEFAULT_CORRECTION_T = 298.15;
/** Neat water, mol/L: common practice (55.34 M from the density at 25 °C also appears). */
export const DEFAULT_NEAT_CONCENTRATION = 55.5;

/** One species' energy in the profile's quantity, J/mol, or why it cannot be had. */
export type SpeciesEnergy =
  | { ok: true; valueJ: number; notes: string[]; rescaled: boolean }
  | { ok: false; missing: string };

function structureEnergyHartree(s: Structure, quantity: Quantity, t: number, t0: number): { value: number; rescaled: boolean } | string {
  const base = s.singlePoint ?? s.electronic;
  if (quantity === 'E') return { value: base, rescaled: false };
  if (quantity === 'H') return s.hCorrection === undefined ? 'no thermal correction to H' : { value: base + s.hCorrection, rescaled: false };
  if (s.gCorrection === undefined) return 'no thermal correction to G';
  if (Math.abs(t - t0) < 1e-9 || s.hCorrection === undefined) return { value: base + s.gCorrection, rescaled: false };
  // S = (H − G)/T0 from the corrections, then G(T) ≈ H − T·S with H held at T0.
  const entropyTerm = (s.hCorrection - s.gCorrection) / t0;
  return { value: base + s.hCorrection - t * entropyTerm, rescaled: true };
}

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
 * (G_eff = −RT ln Σ exp(−G_i/RT)), plus the standard-state correction per species.
 */
export function speciesEnergy(species: Species, ctx: ResolveContext): SpeciesEnergy {
  if (species.structures.length === 0) return { ok: false, missing: 'no absolute energies' };
  const t0 = species.correctionTemperatureK ?? DEFAULT_CORRECTION_T;
  const values: number[] = [];
  let rescaled = false;
  for (const s of species.structures) {
    const e = structureEnergyHartree(s, ctx.quantity, ctx.temperatureK, t0);
    if (typeof e === 'string') return { ok: false, missing: e };
    values.push(toJoulesPerMol(e.value, 'hartree'));
    rescaled ||= e.rescaled;
  }
  const notes: string[] = [];
  let valueJ = values[0]!;
  if (values.length > 1) {
    const populations = ensemblePopulations(values, ctx.temperatureK);
    valueJ = ctx.quantity === 'G'
      ? ensembleFreeEnergyJ(values, ctx.temperatureK)
      : values.reduce((sum, v, i) => sum + v * populations[i]!, 0);
    notes.push(`${values.length} conformers, populations ${populations.map((p) => `${(100 * p).toFixed(1)}%`).join(' / ')}`);
  }
  const shift = standardStateShiftJ(species, ctx);
  if (shift.note) notes.push(shift.note);
  return { ok: true, valueJ: valueJ + shift.shiftJ, notes, rescaled };
}
