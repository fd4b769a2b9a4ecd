import type { CalcAtom } from './calcRecord.ts';

/**
 * Largest difference (Å) at which two geometries still count as the same: 1e-3 Å.
 *
 * Why this size: both readers take coordinates printed to 1e-6 Å, so rounding moves an
 * interatomic distance by at most about 2e-6 Å, and a program's reorientation (a rotation
 * done in double precision, then printed) keeps distances to the same digits. A real change of
 * structure is far larger: a bond moved by 0.05 Å, or two separate optimisations of the same
 * molecule (Gaussian's and ORCA's divinylbenzene in the test fixtures differ by 0.014 Å).
 * 1e-3 Å is also about one step of an optimiser at convergence (Gaussian's default maximum
 * displacement, 0.0018 bohr = 0.00095 Å, is printed in its convergence table), so geometries
 * closer than that are the same stationary point as far as the optimiser can tell.
 */
export const SAME_GEOMETRY_TOLERANCE_A = 1e-3;

// Pairing compares each single point with each frequency file; each geometry's distances are computed once.
const cache = new WeakMap<readonly CalcAtom[], Map<string, number[]>>();

function distancesByPair(atoms: readonly CalcAtom[]): Map<string, number[]> {
  const cached = cache.get(atoms);
  if (cached) return cached;
  const byPair = new Map<string, number[]>();
  for (let i = 0; i < atoms.length; i++) {
    const a = atoms[i]!;
    for (let j = i + 1; j < atoms.length; j++) {
      const b = atoms[j]!;
      const key = a.symbol < b.symbol ? `${a.symbol}-${b.symbol}` : `${b.symbol}-${a.symbol}`;
      const list = byPair.get(key) ?? [];
      list.push(Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z));
      byPair.set(key, list);
    }
  }
  for (const list of byPair.values()) list.sort((p, q) => p - q);
  cache.set(atoms, byPair);
  return byPair;
}

/**
 * How far apart two geometries are, independent of orientation, position and atom order:
 * the interatomic distances of each element pair (C–C, C–H, …) are sorted and compared in
 * order, and the largest difference in Å is returned; null when the two do not have the same
 * atoms. A distance-set comparison (as in distance-geometry methods: Crippen & Havel, Distance
 * Geometry and Molecular Conformation, 1988) cannot tell mirror images apart, which does not
 * matter here: enantiomers have the same energy and frequencies.
 */
export function geometryDeviation(a: readonly CalcAtom[], b: readonly CalcAtom[]): number | null {
  const symbols = (atoms: readonly CalcAtom[]) => atoms.map((t) => t.symbol).sort().join(' ');
  if (a.length !== b.length || symbols(a) !== symbols(b)) return null;
  const da = distancesByPair(a);
  const db = distancesByPair(b);
  if (da.size !== db.size) return null;
  let largest = 0;
  for (const [key, listA] of da) {
    const listB = db.get(key);
    if (!listB || listB.length !== listA.length) return null;
    for (let k = 0; k < listA.length; k++) largest = Math.max(largest, Math.abs(listA[k]! - listB[k]!));
  }
  return largest;
}
