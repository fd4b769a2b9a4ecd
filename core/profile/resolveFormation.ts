import type { SpeciesTerm } from '../model/schema.ts';
import type { ResolveContext } from './context.ts';
import { formationKey, formationSumJ } from './formationSum.ts';
import type { RawPoint } from './resolvePathway.ts';
import type { Finding } from './types.ts';

/** Temperature of tabulated standard formation data (NIST-JANAF, CODATA key values). */
export const FORMATION_T = 298.15;

/**
 * A state given as a sum of standard formation values (Hess's law): for G, Σ count ×
 * (ΔfH° − T·S°) at the document's temperature when every formation species has ΔfH° and S°
 * (so state differences are ΔrH° − TΔrS°, as `passline thermo` gives; NIST-JANAF, Chase 1998),
 * else Σ count × ΔfG° (298.15 K only); for H, Σ count × ΔfH°. Electronic energies E have no
 * formation counterpart. ΔrH° and ΔrS° are taken constant (ΔrCp = 0), which is stated.
 */
export function resolveFormationState(terms: readonly SpeciesTerm[], ctx: ResolveContext, where: { pathway: string; point: string }): RawPoint & { findings: Finding[] } {
  const findings: Finding[] = [];
  const approximations: string[] = [];
  const key = formationKey(ctx);
  const fromHS = key === 'dfG' && ctx.formationRoute === 'dH-TS';
  const symbol = key === 'dfG' ? (fromHS ? `(ΔfH° − T·S°) at ${ctx.temperatureK} K` : 'ΔfG°') : 'ΔfH°';
  const list = terms.map((t) => `${t.count} × ${ctx.species.get(t.species)!.label}`).join(' + ');
  let valueJ: number | null = null;
  if (!key) {
    findings.push({ severity: 'error', code: 'formation-needs-h-or-g', ...where, message: 'formation data give H or G, not the electronic energy E; choose H or G' });
  } else {
    const sum = formationSumJ(terms, ctx);
    if (sum.ok) valueJ = sum.valueJ;
    else findings.push({ severity: 'error', code: 'missing-species-data', ...where, message: `species "${sum.missing}" has no ${fromHS ? 'ΔfH° and S°' : symbol}` });
    if (fromHS && Math.abs(ctx.temperatureK - FORMATION_T) > 1e-9) {
      approximations.push(`${FORMATION_T} K values of ΔfH° and S° used at ${ctx.temperatureK} K (ΔrH° and ΔrS° taken constant, ΔrCp = 0; no phase changes)`);
    } else if (Math.abs(ctx.temperatureK - FORMATION_T) > 1e-9) {
      const text = `standard formation values are for ${FORMATION_T} K and are used unchanged at ${ctx.temperatureK} K`;
      approximations.push(text);
      findings.push({ severity: 'warning', code: 'temperature-mismatch', ...where, message: text });
    }
  }
  const detail = `Hess's law: Σ ${symbol} of ${list}`;
  return { raw: { valueJ, scale: 'formation' }, provenance: { route: valueJ === null ? 'missing' : 'formation', detail, approximations }, findings };
}
