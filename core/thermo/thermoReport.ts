import { fromJoulesPerMol, toJoulesPerMol } from '../units/energy.ts';
import { crossoverTemperatureK, lnEquilibriumConstant } from './equilibrium.ts';
import { parseFormationTable } from './formationTable.ts';
import { FORMATION_LABELS, type FormationKey } from './formationValues.ts';
import { hessReaction } from './hess.ts';
import { checkReactionBalance } from './reactionBalance.ts';
import { parseReaction } from './reaction.ts';

/** Numbers of a thermochemistry report: kJ/mol, J/(mol K), K; null when not available. */
export interface ThermoReportResult {
  temperatureK: number;
  dH: number | null;
  dS: number | null;
  /** ΔrH° − TΔrS° at temperatureK. */
  dG: number | null;
  /** Σ ν ΔfG° — only at the table temperature (298.15 K), else null. */
  dGfromFormation: number | null;
  K: number | null;
  /**
   * The route K = exp(−ΔrG°/RT) takes: `dH-TdS` (ΔrH° − TΔrS°, used at every temperature when
   * ΔfH° and S° are all known, so K(T) is continuous) or `dfG` (ΣνΔfG°, 298.15 K only, when
   * ΔfH° or S° is missing). Standard state: that of the table (1 bar for NIST-JANAF).
   */
  KBasis: 'dH-TdS' | 'dfG';
  /** K from ΣνΔfG° at 298.15 K, for comparison with `K` (differs by table rounding); else null. */
  KfromFormation: number | null;
  crossoverK: number | null;
  warnings: string[];
}

/** What {@link thermoReport} returns; `message` is one line. */
export type ThermoReport = { ok: true; result: ThermoReportResult } | { ok: false; message: string };

const TABLE_T = 298.15;
// Our own threshold for the safety caution (no authoritative single value exists).
const EXOTHERM_CAUTION_KJ = -100;

const fmt = (x: number, digits = 3): string => x.toFixed(digits);

/**
 * Reaction thermochemistry from a formation table (CSV, see {@link parseFormationTable}) and a
 * reaction string at one temperature: Hess's law sums, ΔrG° both ways, K = exp(−ΔrG°/RT)
 * (from ΔrH° − TΔrS° whenever both are known, at every temperature, so K(T) has no step at
 * 298.15 K; from ΣνΔfG° at 298.15 K otherwise; `KBasis` says which), crossover temperature, and
 * warnings for approximations. The CLI `passline thermo` prints this result as is.
 */
export function thermoReport(tableText: string, reactionText: string, temperatureK: number): ThermoReport {
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) return { ok: false, message: `temperature must be a positive number of kelvin, got ${temperatureK}` };
  const table = parseFormationTable(tableText);
  if (!table.ok) {
    const [e] = table.errors;
    const more = table.errors.length > 1 ? ` (and ${table.errors.length - 1} more)` : '';
    return { ok: false, message: `table row ${e?.row}, column '${e?.column}': ${e?.message}${more}` };
  }
  const reaction = parseReaction(reactionText);
  if (!reaction.ok) return { ok: false, message: `reaction: ${reaction.message}` };
  const balance = checkReactionBalance(reaction.value);
  if (!balance.ok) return { ok: false, message: `reaction: ${balance.message}` };
  const { data, rows, columns } = table.value;
  const hess = hessReaction(reaction.value, data, temperatureK, { tableTemperatureK: TABLE_T });
  if (hess.unknown.length > 0) {
    return { ok: false, message: `unknown species ${hess.unknown.map((s) => `'${s}'`).join(', ')}: not in the table (names must match, phase included)` };
  }
  const warnings: string[] = [];
  const missingText = (key: FormationKey): string => !columns.includes(key) ? `the table has no ${FORMATION_LABELS[key]} column` :
    `no ${FORMATION_LABELS[key]} for ${hess.missing[key].map((s) => `${s} (row ${rows.get(s)})`).join(', ')}`;
  const atTableT = Math.abs(temperatureK - TABLE_T) < 0.005;
  const dGf = hess.dGFormationJ;
  const KBasis = hess.dGJ !== null || !atTableT || dGf === null ? 'dH-TdS' : 'dfG';
  const dGforK = KBasis === 'dH-TdS' ? hess.dGJ : dGf;
  if (dGforK === null) {
    const reasons = (['dfH', 'S'] as const).filter((k) => hess.missing[k].length > 0).map(missingText);
    if (atTableT) reasons.push(missingText('dfG'));
    return { ok: false, message: `cannot compute ΔrG° at ${temperatureK} K: ${reasons.join('; ')}` };
  }
  for (const key of ['dfH', 'S', 'dfG'] as const) if (hess.missing[key].length > 0) warnings.push(missingText(key));
  if (!atTableT) {
    warnings.push(`approximation: 298.15 K formation data used at ${temperatureK} K (ΔrH° and ΔrS° taken as constant, ΔrCp = 0; no phase changes)`);
    if (dGf !== null) warnings.push(`ΣνΔfG° = ${fmt(fromJoulesPerMol(dGf, 'kJ/mol'))} kJ/mol applies at 298.15 K only and is not used at ${temperatureK} K`);
  }
  if (hess.routesDisagree && hess.routeDifferenceJ !== null) {
    warnings.push(`the two ΔrG° routes at 298.15 K differ by ${fmt(fromJoulesPerMol(hess.routeDifferenceJ, 'kJ/mol'), 4)} kJ/mol (ΔrH° − TΔrS° minus ΣνΔfG°): check the table's consistency`);
  }
  const lnK = lnEquilibriumConstant(dGforK, temperatureK);
  const K = Math.exp(lnK);
  if (!Number.isFinite(K) || K === 0) warnings.push(`K is outside the floating-point range: log10 K = ${fmt(lnK / Math.LN10)}`);
  const crossoverK = hess.dHJ !== null && hess.dSJK !== null ? crossoverTemperatureK(hess.dHJ, hess.dSJK) : null;
  if (crossoverK !== null) {
    warnings.push(`crossover temperature ${fmt(crossoverK, 1)} K is formal only: it assumes ΔrH° and ΔrS° do not change with temperature and no species changes phase`);
  }
  if (hess.dHJ !== null && hess.dHJ < toJoulesPerMol(EXOTHERM_CAUTION_KJ, 'kJ/mol')) {
    warnings.push('caution: strongly exothermic; these energies are not a process-safety assessment — confirm by calorimetry and defer to local codes and licensed practice');
  }
  const kj = (x: number | null): number | null => (x === null ? null : fromJoulesPerMol(x, 'kJ/mol'));
  return {
    ok: true,
    result: {
      temperatureK,
      dH: kj(hess.dHJ),
      dS: hess.dSJK,
      dG: kj(hess.dGJ),
      dGfromFormation: atTableT ? kj(dGf) : null,
      K: Number.isFinite(K) ? K : null,
      KBasis,
      KfromFormation: atTableT && dGf !== null && Number.isFinite(Math.exp(lnEquilibriumConstant(dGf, temperatureK))) ? Math.exp(lnEquilibriumConstant(dGf, temperatureK)) : null,
      crossoverK,
      warnings,
    },
  };
}
