import type { SpeciesTerm } from '../model/schema.ts';
import type { ResolveContext } from './context.ts';
import { formationKey, formationSumJ } from './formationSum.ts';
import type { RawPoint } from './resolvePathway.ts';
import type { Finding } from './types.ts';

/** Temperature of tabulated standard formation data (NIST-JANAF, CODATA key values). */
export const FORMATION_T = 298.15;

/**
 * A state given as a sum of standard formation values (Hess's law): Σ count × ΔfG° for G,
 * Σ count × ΔfH° for H. Electronic energies E have no formation counterpart.
 */
export function resolveFormationState(terms: readonly SpeciesTerm[], ctx: ResolveContext, where: { pathway: string; point: string }): RawPoint & { findings: Finding[] } {
  const findings: Finding[] = [];
  const approximations: string[] = [];
  const key = formationKey(ctx);
  const symbol = key === 'dfG' ? 'ΔfG°' : 'ΔfH°';
  const list = terms.map((t) => `${t.count} × ${ctx.species.get(t.species)!.label}`).join(' + ');
  let valueJ: number | null = null;
  if (!key) {
    findings.push({ severity: 'error', code: 'formation-needs-h-or-g', ...where, message: 'formation data give H or G, not the electronic energy E; choose H or G' });
  } else {
    const sum = formationSumJ(terms, ctx);
    if (sum.ok) valueJ = sum.valueJ;
    else findings.push({ severity: 'error', code: 'missing-species-data', ...where, message: `species "${sum.missing}" has no ${symbol}` });
    if (Math.abs(ctx.temperatureK - FORMATION_T) > 1e-9) {
      const text = `standard formation values are for ${FORMATION_T} K and are used unchanged at ${ctx.temperatureK} K`;
      approximations.push(text);
      findings.push({ severity: 'warning', code: 'temperature-mismatch', ...where, message: text });
    }
  }
  const detail = `Hess's law: Σ ${symbol} of ${list}`;
  return { raw: { valueJ, scale: 'formation' }, provenance: { route: valueJ === null ? 'missing' : 'formation', detail, approximations }, findings };
}
