import type { Quantity, Species, Structure } from '../model/schema.ts';
import { toJoulesPerMol } from '../units/energy.ts';
import { rrhoCorrectionsAt } from './rrhoCorrections.ts';

/** Temperature assumed for thermal corrections when a species does not say (the usual default of quantum-chemistry programs). */
export const DEFAULT_CORRECTION_T = 298.15;

/**
 * One conformer's energy in the profile's quantity, hartree: E (or its single point) plus the
 * thermal correction to H or G, or why it cannot be had. G away from the corrections'
 * temperature T0 is recomputed exactly when the structure carries its frequencies and RRHO
 * data; otherwise G(T) ≈ H − T·S with S = (H − G)/T0 (H and S held at T0).
 */
export function structureEnergyHartree(s: Structure, quantity: Quantity, t: number, t0: number): { value: number; rescaled: boolean } | string {
  const base = s.singlePoint ?? s.electronic;
  if (quantity === 'E') return { value: base, rescaled: false };
  if (quantity === 'H') {
    if (s.hCorrection === undefined) return 'no thermal correction to H';
    const exactH = Math.abs(t - t0) < 1e-9 ? null : rrhoCorrectionsAt(s, t);
    return { value: base + (exactH?.h ?? s.hCorrection), rescaled: false };
  }
  if (s.gCorrection === undefined) return 'no thermal correction to G';
  if (Math.abs(t - t0) < 1e-9 || s.hCorrection === undefined) return { value: base + s.gCorrection, rescaled: false };
  // Frequencies and RRHO data on the structure: G at t exactly, not H − T·S.
  const exact = rrhoCorrectionsAt(s, t);
  if (exact) return { value: base + exact.g, rescaled: false };
  const entropyTerm = (s.hCorrection - s.gCorrection) / t0;
  return { value: base + s.hCorrection - t * entropyTerm, rescaled: true };
}

/** Every conformer's energy of a species in J/mol, or the first one that cannot be had (0-based index). */
export type StructureEnergies =
  | { ok: true; valuesJ: number[]; rescaled: boolean }
  | { ok: false; index: number; missing: string };

/** The conformers' energies of a species in `quantity` at `temperatureK`, J/mol. */
export function structureEnergiesJ(species: Species, quantity: Quantity, temperatureK: number): StructureEnergies {
  const t0 = species.correctionTemperatureK ?? DEFAULT_CORRECTION_T;
  const valuesJ: number[] = [];
  let rescaled = false;
  for (const [index, s] of species.structures.entries()) {
    const e = structureEnergyHartree(s, quantity, temperatureK, t0);
    if (typeof e === 'string') return { ok: false, index, missing: e };
    valuesJ.push(toJoulesPerMol(e.value, 'hartree'));
    rescaled ||= e.rescaled;
  }
  return { ok: true, valuesJ, rescaled };
}
