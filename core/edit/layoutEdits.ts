import type { Document } from '../model/schema.ts';
import { mapPoint } from './mapPathway.ts';
import type { PointRef } from './pointEdits.ts';

/**
 * Sets a point's horizontal position (in slot units, as the layout reads `x`); `null`
 * returns it to the automatic slot.
 */
export function setPointX(doc: Document, args: PointRef & { x: number | null }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => {
    if (args.x === null) {
      if (p.x === undefined) return p;
      const { x: _x, ...rest } = p;
      return rest;
    }
    return !Number.isFinite(args.x) || p.x === args.x ? p : { ...p, x: args.x };
  });
}

/** Sets where a point's label sits relative to its automatic place (mm); `null` clears it. */
export function setLabelOffset(doc: Document, args: PointRef & { offset: { dx: number; dy: number } | null }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => {
    const o = args.offset;
    if (o === null) {
      if (!p.labelOffsetMm) return p;
      const { labelOffsetMm: _o, ...rest } = p;
      return rest;
    }
    if (!Number.isFinite(o.dx) || !Number.isFinite(o.dy)) return p;
    if (p.labelOffsetMm && p.labelOffsetMm.dx === o.dx && p.labelOffsetMm.dy === o.dy) return p;
    return { ...p, labelOffsetMm: { dx: o.dx, dy: o.dy } };
  });
}
