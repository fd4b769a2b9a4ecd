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

/** Ratio, er and ee of the two major products (the two largest shares, in list order). */
export interface PairSelectivity {
  /** Ids of the two channels the ratio is about, [first, second] in list order. */
  of: [string, string];
  /** [first]/[second]. */
  ratio: number;
  /** G_eff(second) − G_eff(first), J/mol. */
  ddgJ: number;
  /** Major : minor as r : 1 (r ≥ 1). */
  er: number;
  /** Excess of the major product, a fraction in [0, 1). */
  ee: number;
  major: string;
  /** The other of the two. */
  minor: string;
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
  if (shares.length < 2) return { channels: shares, pair: null };
  // The two largest shares; with three or more products the ratio describes those two, named.
  const top = [...shares.keys()].sort((i, j) => shares[j]!.fraction - shares[i]!.fraction || i - j).slice(0, 2).sort((i, j) => i - j);
  const a = shares[top[0]!]!, b = shares[top[1]!]!;
  const ddgJ = b.effectiveTsJ - a.effectiveTsJ;
  const ratio = ratioFromDdg(ddgJ, temperatureK);
  return {
    channels: shares,
    pair: { of: [a.id, b.id], ratio, ddgJ, er: Math.max(ratio, 1 / ratio), ee: Math.abs(eeFromDdg(ddgJ, temperatureK)), major: ddgJ >= 0 ? a.id : b.id, minor: ddgJ >= 0 ? b.id : a.id },
  };
}
