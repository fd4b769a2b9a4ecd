import type { Document } from '../../core/model/schema.ts';
import { dragBlockedReason } from '../../core/edit/dragEnergy.ts';
import { dragEnergy } from '../../core/edit/dragEnergy.ts';
import { setPointX } from '../../core/edit/layoutEdits.ts';
import { toJoulesPerMol } from '../../core/units/energy.ts';
import { energyDecimals } from '../../core/format/energyDecimals.ts';

/** The point with this id in this pathway of the document. */
export function findPoint(doc: Document, pathway: string, point: string) {
  return doc.pathways.find((p) => p.id === pathway)?.points.find((p) => p.id === point);
}

/** Why the level of a point cannot be dragged vertically (null when it can). */
export function levelLock(doc: Document, pathway: string, point: string): string | null {
  const p = findPoint(doc, pathway, point);
  return p ? dragBlockedReason(p) : null;
}

/**
 * The edit an arrow key makes on a focused level: up/down by one shown decimal of the
 * display unit (ten with Shift), left/right by a tenth of a slot (a whole slot with Shift).
 */
export function nudge(doc: Document, pathway: string, point: string, key: string, shift: boolean, slot: number): Document | null {
  const step = 10 ** -energyDecimals(doc.settings, doc.settings.unit) * (shift ? 10 : 1);
  if (key === 'ArrowUp' || key === 'ArrowDown') {
    const deltaJ = toJoulesPerMol(key === 'ArrowUp' ? step : -step, doc.settings.unit);
    return dragEnergy(doc, { pathway, point, deltaJ });
  }
  if (key === 'ArrowLeft' || key === 'ArrowRight') {
    const current = findPoint(doc, pathway, point)?.x ?? slot;
    const d = (shift ? 1 : 0.1) * (key === 'ArrowRight' ? 1 : -1);
    return setPointX(doc, { pathway, point, x: Number((current + d).toFixed(2)) });
  }
  return null;
}

/** Undo group of a nudge: a run of energy nudges is one step, a run of position nudges another. */
export function nudgeGroup(key: string, pathway: string, point: string): string {
  return `nudge:${key === 'ArrowUp' || key === 'ArrowDown' ? 'energy' : 'position'}:${pathway}:${point}`;
}
