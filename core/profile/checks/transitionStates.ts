import type { Finding } from '../types.ts';
import { EQUAL_J, showEnergy, type CheckInput } from './checkContext.ts';

/**
 * A transition state must lie above the minima on both sides. A TS below a neighbour after
 * corrections means a negative barrier (REFERENCE.md §10: flag it, never report k > k_BT/h).
 */
export function checkTransitionStates({ doc, pathways }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  for (const pathway of pathways) {
    pathway.points.forEach((point, i) => {
      if (point.kind !== 'ts') return;
      const where = { pathway: pathway.id, point: point.id };
      const neighbours = [pathway.points[i - 1], pathway.points[i + 1]];
      if (neighbours.some((n) => !n || n.kind !== 'min')) {
        findings.push({ severity: 'warning', code: 'ts-without-minima', ...where, message: `transition state "${point.label}" needs a minimum on each side` });
      }
      if (point.energyJ === null) return;
      for (const n of neighbours) {
        if (!n || n.kind !== 'min' || n.energyJ === null) continue;
        const gap = point.energyJ - n.energyJ;
        if (gap < -EQUAL_J) {
          findings.push({ severity: 'error', code: 'ts-below-neighbour', ...where, message: `transition state "${point.label}" lies ${showEnergy(doc, -gap)} below the neighbouring minimum "${n.label}" (negative barrier)` });
        } else if (gap <= EQUAL_J) {
          findings.push({ severity: 'warning', code: 'zero-barrier', ...where, message: `transition state "${point.label}" has the same energy as the neighbouring minimum "${n.label}" (zero barrier)` });
        }
      }
    });
  }
  return findings;
}
