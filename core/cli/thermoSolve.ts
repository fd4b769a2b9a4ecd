import { parseFormationTable } from '../thermo/formationTable.ts';
import type { FormationKey } from '../thermo/formationValues.ts';
import { parseReaction } from '../thermo/reaction.ts';
import { solveFormationValue } from '../thermo/solveFormation.ts';
import { CliError, EXIT_USAGE } from './io.ts';

/** `dH=-91.8` style reaction values and the formation value each one solves for, with units. */
const GIVEN: Record<string, { key: FormationKey; unit: string; solved: string; reaction: string }> = {
  dH: { key: 'dfH', unit: 'kJ mol⁻¹', solved: 'ΔfH°', reaction: 'ΔrH°' },
  dS: { key: 'S', unit: 'J mol⁻¹ K⁻¹', solved: 'S°', reaction: 'ΔrS°' },
  dG: { key: 'dfG', unit: 'kJ mol⁻¹', solved: 'ΔfG°', reaction: 'ΔrG°' },
};

/** A back-solved formation value (`thermo --solve`, also its `--json` form). */
export interface SolvedFormation {
  species: string;
  /** Which value: dfH, S or dfG. */
  key: FormationKey;
  symbol: string;
  value: number;
  unit: string;
  /** The reaction value it was solved from. */
  given: { symbol: string; value: number; unit: string };
  method: string;
}

/** The one printed line of a {@link SolvedFormation}. */
export function solvedLine(s: SolvedFormation): string {
  return `${s.symbol}(${s.species}) = ${s.value.toFixed(3)} ${s.unit}   (from ${s.given.symbol} = ${s.given.value} ${s.given.unit} and the table, Hess's law)\n`;
}

/**
 * Back-solves one species' formation value from a known reaction value (Hess's law):
 * `--solve "NH3(g)" --given dH=-91.8` gives ΔfH°(NH3, g).
 */
export function solveFormation(tableText: string, reactionText: string, species: string, given: string): SolvedFormation {
  const match = /^\s*(dH|dS|dG)\s*=\s*(\S+)\s*$/.exec(given);
  const value = match ? Number(match[2]!.replace('\u2212', '-')) : Number.NaN;
  if (!match || !Number.isFinite(value)) throw new CliError(`--given: expected dH=VALUE (kJ/mol), dS=VALUE (J/(mol K)) or dG=VALUE (kJ/mol), got "${given}"`, EXIT_USAGE);
  const { key, unit, solved: symbol, reaction: givenSymbol } = GIVEN[match[1]!]!;
  const table = parseFormationTable(tableText);
  if (!table.ok) throw new CliError(`table row ${table.errors[0]?.row}: ${table.errors[0]?.message}`);
  const reaction = parseReaction(reactionText);
  if (!reaction.ok) throw new CliError(`reaction: ${reaction.message}`);
  const solved = solveFormationValue(reaction.value, table.value.data, species, key, value);
  if (!solved.ok) throw new CliError(solved.message);
  return { species, key, symbol, value: solved.value, unit, given: { symbol: givenSymbol, value, unit }, method: "Hess's law" };
}
