import { toJoulesPerMol } from '../units/energy.ts';
import type { FormationData, FormationKey } from './formationValues.ts';
import type { Reaction } from './reaction.ts';
import { reactionSum } from './reactionSum.ts';

/** Reaction thermochemistry from formation data, in SI units. */
export interface HessResult {
  temperatureK: number;
  /** ΔrH° = Σ ν ΔfH° in J/mol, null when a ΔfH° is missing. */
  dHJ: number | null;
  /** ΔrS° = Σ ν S° in J/(mol K), null when an S° is missing. */
  dSJK: number | null;
  /** ΔrG° = ΔrH° − T ΔrS° at the requested temperature, J/mol. */
  dGJ: number | null;
  /** ΔrG° = Σ ν ΔfG° (at the table temperature), J/mol. */
  dGFormationJ: number | null;
  /** (ΔrH° − T_table ΔrS°) − Σ ν ΔfG°, J/mol: how far the two routes disagree on the table's own data. */
  routeDifferenceJ: number | null;
  /** True when |routeDifferenceJ| exceeds the tolerance. */
  routesDisagree: boolean;
  /** Species missing each value (the reason a result is null). */
  missing: Record<FormationKey, string[]>;
  /** Species of the reaction that are not in the data at all. */
  unknown: string[];
}

/** Options for {@link hessReaction}. */
export interface HessOptions {
  /** Temperature of the formation data, K (298.15 for NIST-JANAF standard tables). */
  tableTemperatureK?: number;
  /** Largest accepted difference between the two ΔrG° routes, J/mol (default 0.01 kJ/mol). */
  toleranceJ?: number;
}

/**
 * Hess's law for one reaction: ΔrH°, ΔrS°, ΔrG° = ΔrH° − TΔrS° and ΔrG° = ΣνΔfG°, with a
 * flag when the two ΔrG° routes disagree on the table's data (they agree to table rounding
 * for consistent data: NIST-JANAF, Chase 1998; REFERENCE.md §4). Formation values are in table
 * units (kJ/mol, J/(mol K)); results in J/mol and J/(mol K).
 */
export function hessReaction(reaction: Reaction, data: FormationData, temperatureK: number, options: HessOptions = {}): HessResult {
  const tableT = options.tableTemperatureK ?? 298.15;
  const tolerance = options.toleranceJ ?? toJoulesPerMol(0.01, 'kJ/mol');
  const kj = (x: number): number => toJoulesPerMol(x, 'kJ/mol');
  const missing: Record<FormationKey, string[]> = { dfH: [], S: [], dfG: [] };
  let unknown: string[] = [];
  const sum = (key: FormationKey, toSi: (x: number) => number): number | null => {
    const r = reactionSum(reaction, data, key);
    if (r.ok) return toSi(r.value);
    missing[key] = r.missing;
    unknown = r.unknown;
    return null;
  };
  const dHJ = sum('dfH', kj);
  const dSJK = sum('S', (x) => x);
  const dGFormationJ = sum('dfG', kj);
  const dGJ = dHJ !== null && dSJK !== null ? dHJ - temperatureK * dSJK : null;
  const routeDifferenceJ = dHJ !== null && dSJK !== null && dGFormationJ !== null ? dHJ - tableT * dSJK - dGFormationJ : null;
  return {
    temperatureK, dHJ, dSJK, dGJ, dGFormationJ, routeDifferenceJ,
    routesDisagree: routeDifferenceJ !== null && Math.abs(routeDifferenceJ) > tolerance,
    missing, unknown,
  };
}
