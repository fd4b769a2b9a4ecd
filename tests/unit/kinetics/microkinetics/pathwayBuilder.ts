import type { ResolvedPathway } from '../../../../core/profile/types.ts';

/** Thermochemical kcal (NIST SP 811, exact). */
export const KCAL = 4184;

/** A resolved pathway from [label, kind, energy in kcal/mol] triples; ids equal labels. */
export function pathway(points: [string, 'min' | 'ts', number | null][], cycle = false): ResolvedPathway {
  return {
    id: 'path',
    name: 'test path',
    cycle,
    points: points.map(([label, kind, kcal]) => ({
      id: label, label, kind, energyJ: kcal === null ? null : kcal * KCAL,
      provenance: { route: 'typed', detail: 'test', approximations: [] },
    })),
  };
}

// REFERENCE.md §6, Kozuch & Shaik ACR 2011 conventions, cycle A (kcal/mol, 298.15 K).
export const cycleA = pathway([
  ['I1', 'min', 0], ['T1', 'ts', 12], ['I2', 'min', -6], ['T2', 'ts', 15], ['I3', 'min', -4.5],
  ['T3', 'ts', 16.5], ['I4', 'min', -3], ['T4', 'ts', 8], ['I1′', 'min', -2],
], true);

// REFERENCE.md §6, cycle B (TDTS before TDI).
export const cycleB = pathway([
  ['I1', 'min', 0], ['T1', 'ts', 20], ['I2', 'min', 4], ['T2', 'ts', 19], ['I3', 'min', -10],
  ['T3', 'ts', -3], ['I4', 'min', -18], ['T4', 'ts', -4], ['I1′', 'min', -16],
], true);
