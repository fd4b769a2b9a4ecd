import type { Document, Point } from '../model/schema.ts';
import { fromJoulesPerMol } from '../units/energy.ts';
import { mapPoint } from './mapPathway.ts';
import type { PointRef } from './pointEdits.ts';
import { energyDecimals } from '../format/energyDecimals.ts';

/**
 * Why a point's level cannot be dragged up or down, or null when it can. Only energies the
 * user typed (a value, a step or a barrier) are dragged; an energy derived from species,
 * formation data or an estimate is never silently overwritten.
 */
export function dragBlockedReason(point: Point): string | null {
  switch (point.energy.mode) {
    case 'value': case 'step': case 'barrier': return null;
    case 'species': return `${point.label || point.id} takes its energy from the species sheet; edit those energies, or give the point a typed value to drag it`;
    case 'formation': return `${point.label || point.id} takes its energy from formation data (Hess's law); edit that data, or give the point a typed value to drag it`;
    case 'estimate': return `${point.label || point.id} is a barrier estimate (${point.energy.estimate.method}); change its parameters, or give it a typed value to drag it`;
  }
}

/**
 * Moves a typed, stepwise or barrier energy by `deltaJ` (J/mol), rounded to the document's
 * decimals in the unit it was typed in. Call it on the document from the start of the drag
 * with the total displacement, so rounding never accumulates. Points later in a stepwise
 * chain move with the dragged one, as their energies are given relative to it.
 */
export function dragEnergy(doc: Document, args: PointRef & { deltaJ: number }): Document {
  if (!Number.isFinite(args.deltaJ)) return doc;
  return mapPoint(doc, args.pathway, args.point, (p) => {
    const e = p.energy;
    if (dragBlockedReason(p) !== null || !('value' in e)) return p;
    const step = 10 ** -energyDecimals(doc.settings, e.unit);
    const value = Math.round((e.value + fromJoulesPerMol(args.deltaJ, e.unit)) / step) * step;
    const clean = Number(value.toFixed(energyDecimals(doc.settings, e.unit))) + 0;
    return clean === e.value ? p : { ...p, energy: { ...e, value: clean } };
  });
}
