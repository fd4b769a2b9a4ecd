import type { ResolvedPathway, ResolvedPoint } from '../../../core/profile/types.ts';

/** kcal/mol → J/mol with the thermochemical calorie (NIST SP 811: 1 cal = 4.184 J exactly). */
export const kcal = (v: number): number => v * 4184;

/** J/mol → kcal/mol. */
export const toKcal = (j: number): number => j / 4184;

/** One point of a fixture: [label, kind, energy in kcal/mol or null]. */
export type PointSpec = [string, 'min' | 'ts', number | null];

/** A resolved pathway from [label, kind, kcal/mol] triples; ids equal labels. */
export function pathway(specs: PointSpec[], options: { id?: string; cycle?: boolean } = {}): ResolvedPathway {
  const points: ResolvedPoint[] = specs.map(([label, kind, e]) => ({
    id: label, label, kind, energyJ: e === null ? null : kcal(e),
    provenance: { route: e === null ? 'missing' : 'typed', detail: 'test fixture', approximations: [] },
  }));
  const id = options.id ?? 'p';
  return { id, name: id, cycle: options.cycle ?? false, points };
}

/** A cycle written I1, T1, …, IN, TN, I1′ from alternating energies (kcal/mol). */
export function cycle(energies: number[], id = 'cycle'): ResolvedPathway {
  const n = (energies.length - 1) / 2;
  const specs: PointSpec[] = energies.map((e, k) => {
    if (k === energies.length - 1) return ['I1′', 'min', e];
    return k % 2 === 0 ? [`I${k / 2 + 1}`, 'min', e] : [`T${(k + 1) / 2}`, 'ts', e];
  });
  if (!Number.isInteger(n)) throw new Error('cycle needs I1, T1, …, TN, I1′');
  return pathway(specs, { id, cycle: true });
}

/** Relative difference |a − b| / |b|. */
export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
