import type { Scene } from '../../core/figure/scene.ts';
import type { ResolvedProfile } from '../../core/profile/types.ts';

/** Where a level bar sits on the page (mm). */
export interface LevelBox {
  pathway: string;
  point: string;
  x1: number;
  x2: number;
  y: number;
}

/** How page millimetres map back to energies and slots, read off the drawn levels. */
export interface SceneGeometry {
  levels: LevelBox[];
  /** Page mm per J/mol upwards in energy (negative: y grows downwards). */
  mmPerJ: number;
  /** Page mm per slot (x unit of the document's `x` overrides). */
  mmPerSlot: number;
}

// Unchanged bars keep their box object, so the canvas re-renders only levels that moved.
const boxes = new WeakMap<object, LevelBox>();

export const levelKey = (pathway: string, point: string) => `${pathway}\u0000${point}`;

/**
 * Reads the energy and slot scales from the scene itself (two levels far apart in energy,
 * two in slot), so dragging follows exactly what is drawn. Falls back to a tenth of the
 * page height per 10 kJ/mol when every level sits at one energy (our choice).
 */
export function sceneGeometry(scene: Scene, profile: ResolvedProfile, slots: ReadonlyMap<string, number>): SceneGeometry {
  const energies = new Map<string, number>();
  for (const p of profile.pathways) for (const q of p.points) if (q.energyJ !== null) energies.set(levelKey(p.id, q.id), q.energyJ);
  const levels: LevelBox[] = [];
  for (const item of scene.items) {
    if (item.kind !== 'path' || item.role !== 'level' || !item.pathway || !item.point) continue;
    const [a, b] = item.segments;
    if (a?.op !== 'M' || b?.op !== 'L') continue;
    let box = boxes.get(item);
    if (!box) { box = { pathway: item.pathway, point: item.point, x1: Math.min(a.x, b.x), x2: Math.max(a.x, b.x), y: a.y }; boxes.set(item, box); }
    levels.push(box);
  }
  let lo: LevelBox | undefined, hi: LevelBox | undefined;
  let first: LevelBox | undefined, far: LevelBox | undefined;
  for (const l of levels) {
    const e = energies.get(levelKey(l.pathway, l.point))!;
    if (!lo || e < energies.get(levelKey(lo.pathway, lo.point))!) lo = l;
    if (!hi || e > energies.get(levelKey(hi.pathway, hi.point))!) hi = l;
    const s = slots.get(levelKey(l.pathway, l.point));
    if (s === undefined) continue;
    if (!first) first = l;
    else if (!far || Math.abs(s - slots.get(levelKey(first.pathway, first.point))!) > Math.abs(slots.get(levelKey(far.pathway, far.point))! - slots.get(levelKey(first.pathway, first.point))!)) far = l;
  }
  const eLo = lo ? energies.get(levelKey(lo.pathway, lo.point))! : 0;
  const eHi = hi ? energies.get(levelKey(hi.pathway, hi.point))! : 0;
  const mmPerJ = lo && hi && eHi - eLo > 1e-9 ? (hi.y - lo.y) / (eHi - eLo) : -scene.heightMm / 10 / 10_000;
  const slotGap = first && far ? slots.get(levelKey(far.pathway, far.point))! - slots.get(levelKey(first.pathway, first.point))! : 0;
  const mmPerSlot = first && far && Math.abs(slotGap) > 1e-9 ? ((far.x1 + far.x2) / 2 - (first.x1 + first.x2) / 2) / slotGap : scene.widthMm / 10;
  return { levels, mmPerJ, mmPerSlot };
}
