import { boltzmannEnergy, boltzmannPopulations, eeFromDdg, ratioFromDdg } from './selectivity.ts';

/** One product channel: the TS energies (J/mol, common reference) that lead to it. */
export interface SelectivityChannel {
  id: string;
  label: string;
  /** One TS, or several (conformers, parallel TSs) that are Boltzmann-summed. */
  tsEnergiesJ: readonly number[];
}

/** A channel's share of the products. */
export interface ChannelShare {
  id: string;
  label: string;
  /** −RT ln Σ exp(−G/RT) over the channel's TSs, J/mol. */
  effectiveTsJ: number;
  fraction: number;
  percent: number;
}

/** Ratio, er and ee of the first two channels. */
export interface PairSelectivity {
  /** [first]/[second]. */
  ratio: number;
  /** G_eff(second) − G_eff(first), J/mol. */
  ddgJ: number;
  /** Major : minor as r : 1 (r ≥ 1). */
  er: number;
  /** Excess of the major product, a fraction in [0, 1). */
  ee: number;
  major: string;
}

/**
 * Product distribution under Curtin–Hammett control: fractions proportional to
 * Σ_TS exp(−G_TS/RT) per channel (IUPAC Gold Book "Curtin–Hammett principle"; Seeman,
 * Chem. Rev. 83, 83 (1983)). Only TS energies on a common reference matter. Throws for
 * an empty channel list or a channel without TS energies (programmer error).
 */
export function productDistribution(channels: readonly SelectivityChannel[], temperatureK: number): { channels: ChannelShare[]; pair: PairSelectivity | null } {
  if (channels.length === 0) throw new RangeError('productDistribution needs at least one channel');
  const effective = channels.map((c) => boltzmannEnergy(c.tsEnergiesJ, temperatureK));
  const fractions = boltzmannPopulations(effective, temperatureK);
  const shares = channels.map((c, i) => ({ id: c.id, label: c.label, effectiveTsJ: effective[i]!, fraction: fractions[i]!, percent: 100 * fractions[i]! }));
  const [a, b] = shares;
  if (a === undefined || b === undefined) return { channels: shares, pair: null };
  const ddgJ = b.effectiveTsJ - a.effectiveTsJ;
  const ratio = ratioFromDdg(ddgJ, temperatureK);
  return {
    channels: shares,
    pair: { ratio, ddgJ, er: Math.max(ratio, 1 / ratio), ee: Math.abs(eeFromDdg(ddgJ, temperatureK)), major: ddgJ >= 0 ? a.id : b.id },
  };
}
