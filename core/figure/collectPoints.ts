import type { Document, PointKind } from '../model/schema.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import { fromJoulesPerMol } from '../units/energy.ts';
import { assignSlots } from './assignSlots.ts';

/** A point ready for layout: display-unit energy, slot, and its figure overrides. */
export interface LayoutPoint {
  pathwayIndex: number;
  pathwayId: string;
  pointId: string;
  label: string;
  kind: PointKind;
  /** Energy in the profile's display unit, or null when unknown (not drawn). */
  energy: number | null;
  slot: number;
  barWidthMm?: number;
  labelOffsetMm?: { dx: number; dy: number };
}

/** A visible pathway with its points in order. */
export interface LayoutPathway {
  /** Position in the profile (stable when others are hidden). */
  index: number;
  id: string;
  name: string;
  points: LayoutPoint[];
}

/**
 * Joins the resolved energies with the document's per-point figure settings (by pathway
 * and point id), drops hidden pathways, and assigns shared slots.
 */
export function collectPoints(profile: ResolvedProfile, doc: Document): LayoutPathway[] {
  const docPathways = new Map(doc.pathways.map((p) => [p.id, p]));
  // Keep each pathway's position in the document so hiding one does not recolour the rest.
  const visible = profile.pathways
    .map((p, index) => ({ p, index }))
    .filter(({ p }) => docPathways.get(p.id)?.style.visible !== false);
  const docPoint = (pathwayId: string, pointId: string) => docPathways.get(pathwayId)?.points.find((q) => q.id === pointId);
  const slots = assignSlots(visible.map(({ p }) => p.points.map((q) => ({ label: q.label, x: docPoint(p.id, q.id)?.x }))));
  return visible.map(({ p, index }, v) => ({
    index,
    id: p.id,
    name: p.name,
    points: p.points.map((q, i) => {
      const own = docPoint(p.id, q.id);
      const point: LayoutPoint = {
        pathwayIndex: index, pathwayId: p.id, pointId: q.id, label: q.label, kind: q.kind,
        energy: q.energyJ === null ? null : fromJoulesPerMol(q.energyJ, profile.unit),
        slot: slots[v]![i]!,
      };
      if (own?.barWidthMm !== undefined) point.barWidthMm = own.barWidthMm;
      if (own?.labelOffsetMm) point.labelOffsetMm = own.labelOffsetMm;
      return point;
    }),
  }));
}
