import type { Simulation } from '../kinetics/microkinetics/simulationTypes.ts';
import type { SpeciesRoles } from './speciesNetwork.ts';

/** One reported series: its column name and a value per simulated time. */
export interface ProgressSeries {
  name: string;
  values: number[];
}

/**
 * How far a species simulation has gone, from the network's overall roles: substrate
 * conversion 1 − [S]/[S]₀ for each substrate present at t = 0; product yield
 * ν_L·Δ[P] / (ν_P·[L]₀) against the limiting substrate L (smallest [S]₀/ν_S); and turnover
 * number Δ[P] / [cat]₀ (moles of product per mole of catalyst, IUPAC Gold Book "turnover
 * number" [from memory]) when a regenerated catalyst is present at t = 0. [cat]₀ sums the
 * starting concentrations of the regenerated species only.
 */
export function speciesProgress(simulation: Simulation, roles: SpeciesRoles): ProgressSeries[] {
  const at = (s: string) => simulation.species.indexOf(s);
  const label = (s: string) => simulation.labels[at(s)] ?? s;
  const c0 = simulation.concentrations[0]!;
  const column = (s: string) => simulation.concentrations.map((row) => row[at(s)]!);
  const out: ProgressSeries[] = [];
  const present = Object.entries(roles.substrates).filter(([s]) => c0[at(s)]! > 0);
  for (const [s] of present) out.push({ name: `conversion of ${label(s)}`, values: column(s).map((c) => 1 - c / c0[at(s)]!) });
  const limiting = present.reduce<[string, number] | null>((best, [s, n]) => (best === null || c0[at(s)]! / n < c0[at(best[0])]! / best[1] ? [s, n] : best), null);
  if (limiting) {
    const [l, nl] = limiting;
    for (const [p, np] of Object.entries(roles.products)) out.push({ name: `yield of ${label(p)}`, values: column(p).map((c) => (nl * (c - c0[at(p)]!)) / (np * c0[at(l)]!)) });
  }
  const catalyst = roles.catalyst.reduce((sum, s) => sum + c0[at(s)]!, 0);
  if (catalyst > 0) {
    for (const p of Object.keys(roles.products)) out.push({ name: `TON of ${label(p)}`, values: column(p).map((c) => (c - c0[at(p)]!) / catalyst) });
  }
  return out;
}
