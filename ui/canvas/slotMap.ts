import { collectPoints } from '../../core/figure/collectPoints.ts';
import type { Document } from '../../core/model/schema.ts';
import type { ResolvedProfile } from '../../core/profile/types.ts';
import { levelKey } from './sceneGeometry.ts';

/** The slot the layout gives every drawn point, keyed by pathway and point id. */
export function slotMap(profile: ResolvedProfile, doc: Document): Map<string, number> {
  const out = new Map<string, number>();
  for (const p of collectPoints(profile, doc)) for (const q of p.points) out.set(levelKey(p.id, q.pointId), q.slot);
  return out;
}
