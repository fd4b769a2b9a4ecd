import type { SpeciesTerm } from '../model/schema.ts';
import type { ResolveContext } from './context.ts';
import type { RawPoint } from './resolvePathway.ts';
import type { Finding } from './types.ts';
import { DEFAULT_CORRECTION_T, speciesEnergy } from './speciesEnergy.ts';

const STANDARD_STATE_TEXT = { 'as-computed': 'as computed', '1atm-to-1M': '1 atm → 1 mol/L per species', '1bar-to-1M': '1 bar → 1 mol/L per species' } as const;
const QUANTITY_TEXT = { E: 'E', H: 'E + H correction', G: 'E + G correction' } as const;

/** A state given as a sum of species with counts: Σ count × species energy (absolute). */
export function resolveSpeciesState(terms: readonly SpeciesTerm[], ctx: ResolveContext, where: { pathway: string; point: string }): RawPoint & { findings: Finding[] } {
  const findings: Finding[] = [];
  const approximations: string[] = [];
  const notes: string[] = [];
  let total: number | null = 0;
  for (const term of terms) {
    const species = ctx.species.get(term.species)!;
    const energy = speciesEnergy(species, ctx);
    if (!energy.ok) {
      findings.push({ severity: 'error', code: 'missing-species-data', ...where, message: `species "${species.label}" has ${energy.missing}, needed for ${ctx.quantity}` });
      total = null;
      continue;
    }
    if (total !== null) total += term.count * energy.valueJ;
    if (energy.notes.length) notes.push(`${species.label}: ${energy.notes.join(', ')}`);
    if (energy.weightsFromOwnQuantity) {
      findings.push({ severity: 'warning', code: 'conformer-weights-not-g', ...where, message: `${species.label}: conformers are weighted by exp(−${ctx.quantity}/RT) because not every conformer has a G correction; equilibrium populations follow G` });
    }
    const t0 = species.correctionTemperatureK ?? DEFAULT_CORRECTION_T;
    if (ctx.quantity !== 'E' && Math.abs(t0 - ctx.temperatureK) > 1e-9) {
      const text = energy.rescaled
        ? `${species.label}: G rescaled from ${t0} K to ${ctx.temperatureK} K as H − T·S with S = (H − G)/T0`
        : `${species.label}: thermal correction computed at ${t0} K used at ${ctx.temperatureK} K`;
      approximations.push(text);
      findings.push({ severity: energy.rescaled ? 'info' : 'warning', code: 'temperature-mismatch', ...where, message: text });
    }
  }
  const list = terms.map((t) => `${t.count} × ${ctx.species.get(t.species)!.label}`).join(' + ');
  const detail = `sum of species ${list} (${QUANTITY_TEXT[ctx.quantity]}${ctx.quantity === 'G' ? `, ${STANDARD_STATE_TEXT[ctx.standardState]}` : ''})${notes.length ? `; ${notes.join('; ')}` : ''}`;
  return { raw: { valueJ: total, scale: 'absolute' }, provenance: { route: total === null ? 'missing' : 'species', detail, approximations }, findings };
}
