import type { ResolvedPoint } from '../profile/types.ts';
import { stepTopEnergy } from './stepTopEnergy.ts';

/**
 * For every point of a pathway, the energy its rates pass over (J/mol): a TS raised to the
 * higher of its neighbouring minima by {@link stepTopEnergy}, a minimum as it is, null
 * where the energy (or a TS's neighbour) is unknown. Effective barriers and Curtin–Hammett
 * shares read TS energies through this, so they agree with the step rates.
 */
export function tsTopEnergies(points: readonly ResolvedPoint[]): (number | null)[] {
  const next: (number | null | undefined)[] = new Array(points.length);
  let after: number | null | undefined;
  for (let i = points.length - 1; i >= 0; i--) {
    next[i] = after;
    if (points[i]!.kind === 'min') after = points[i]!.energyJ;
  }
  let before: number | null | undefined;
  return points.map((p, i) => {
    const e = p.energyJ;
    if (p.kind === 'min') {
      before = e;
      return e;
    }
    const to = next[i];
    if (e === null || before === null || to === null) return null;
    // A TS at either end of the pathway has one neighbour; the rule then reads that one.
    const from = before ?? to ?? e;
    return stepTopEnergy(from, e, to ?? from);
  });
}
