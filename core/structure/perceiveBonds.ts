import { COVALENT_RADII, USUAL_VALENCE } from './covalentRadii.ts';
import type { XyzAtom } from './readXyz.ts';

/** A perceived bond between atoms `from` and `to` (indices into the atom list). */
export interface PerceivedBond {
  from: number;
  to: number;
  /** 0 where a metal takes part (drawn as a plain line, no valence), else 1–3. */
  order: 0 | 1 | 2 | 3;
}

/** Bonded when closer than the sum of covalent radii plus this (common practice, from memory). */
export const BOND_TOLERANCE_A = 0.4;

const radius = (element: string) => COVALENT_RADII[element] ?? 1.5;

/**
 * Bonds of a geometry from its interatomic distances (d ≤ r₁ + r₂ + 0.4 Å, Cordero radii),
 * then bond orders: atoms short of their usual valence are paired along bonds, atoms with
 * the fewest such partners first — a greedy matching that gives one Kekulé structure for
 * ordinary aromatic rings, C=O, C≡N and the like. Charges are not located (XYZ has none),
 * so a charged or radical centre may keep a bond order too low; the formula is unaffected.
 * O(n²) in the atom count, fine for molecules of a few hundred atoms.
 */
export function perceiveBonds(atoms: readonly XyzAtom[]): PerceivedBond[] {
  const bonds: PerceivedBond[] = [];
  for (let i = 0; i < atoms.length; i++) {
    for (let j = i + 1; j < atoms.length; j++) {
      const a = atoms[i]!, b = atoms[j]!;
      const d = Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);
      if (d > 0.1 && d <= radius(a.element) + radius(b.element) + BOND_TOLERANCE_A) {
        const metal = USUAL_VALENCE[a.element] === undefined || USUAL_VALENCE[b.element] === undefined;
        bonds.push({ from: i, to: j, order: metal ? 0 : 1 });
      }
    }
  }
  assignOrders(atoms, bonds);
  return bonds;
}

function assignOrders(atoms: readonly XyzAtom[], bonds: PerceivedBond[]): void {
  const deficit = atoms.map((a) => USUAL_VALENCE[a.element] ?? 0);
  for (const b of bonds) if (b.order > 0) { deficit[b.from]!--; deficit[b.to]!--; }
  const open = (b: PerceivedBond) => b.order > 0 && b.order < 3 && deficit[b.from]! > 0 && deficit[b.to]! > 0;
  const partners = (atom: number) => bonds.filter((b) => open(b) && (b.from === atom || b.to === atom)).length;
  for (;;) {
    const candidates = bonds.filter(open);
    if (candidates.length === 0) return;
    let best = candidates[0]!, bestScore = Infinity;
    for (const b of candidates) {
      const score = Math.min(partners(b.from), partners(b.to)) * 1000 + Math.max(partners(b.from), partners(b.to));
      if (score < bestScore) { best = b; bestScore = score; }
    }
    best.order = (best.order + 1) as 2 | 3;
    deficit[best.from]!--;
    deficit[best.to]!--;
  }
}
