import { boxIndex } from './boxIndex.ts';
import { inside } from './geometry.ts';
import type { Box } from './scene.ts';

/** A label to place next to its level bar. */
export interface LabelRequest {
  /** Bar centre and half width, mm. */
  x: number;
  y: number;
  halfWidth: number;
  w: number;
  h: number;
  prefer: 'above' | 'below';
  /** A user offset from the preferred spot: the label goes exactly there. */
  fixed?: { dx: number; dy: number };
}

/** Where a label went, and whether it sits away from its bar (needs a leader line). */
export interface Placement {
  box: Box;
  displaced: boolean;
}

/** What labels must keep clear of: `hard` always (bars), `soft` when a nearby spot allows (connector pieces). */
export interface Obstacles {
  hard: readonly Box[];
  soft: readonly Box[];
}

/**
 * Greedy, deterministic placement: labels are taken in the order given; each looks at
 * spots at growing distance from its bar — above and below, then right and left of it —
 * and takes the cheapest whose box (grown by `gap`) touches no bar and no label placed
 * before it and lies inside `bounds`. Cost grows with the distance; the non-preferred
 * side, a spot beside the bar and crossing a soft obstacle (a connector) cost extra.
 * If nothing fits inside, the label goes just above everything (outside the bounds but
 * still clear), so boxes never overlap.
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: Obstacles, bounds: Box, gap: number, step = 0.5): Placement[] {
  const cell = Math.max(2, ...requests.slice(0, 50).map((r) => r.w));
  const hard = boxIndex(cell);
  const soft = boxIndex(cell);
  obstacles.hard.forEach(hard.add);
  obstacles.soft.forEach(soft.add);
  return requests.map((r) => {
    const home = spot(r, r.prefer, 0, gap);
    const placement: Placement = r.fixed
      ? { box: { ...home, x: home.x + r.fixed.dx, y: home.y + r.fixed.dy }, displaced: false }
      : cheapest(r, bounds, gap, step, (b) => !hard.hits(b, gap), (b) => soft.hits(b, 0))
        ?? { box: { ...home, y: Math.min(hard.top(), bounds.y) - 2 * gap - r.h }, displaced: true };
    hard.add(placement.box);
    return placement;
  });
}

function cheapest(r: LabelRequest, bounds: Box, gap: number, step: number, free: (b: Box) => boolean, crossesSoft: (b: Box) => boolean): Placement | undefined {
  const other = r.prefer === 'above' ? 'below' : 'above';
  step = Math.max(step, r.h / 3);
  const limit = Math.ceil((bounds.h + r.h) / step);
  // Extra costs in mm, as multiples of the label height (our tuning).
  const [otherSide, beside, soft] = [0.3 * r.h, 2 * r.h, r.h];
  let best: { placement: Placement; cost: number } | undefined;
  for (let i = 0; i <= limit; i++) {
    const d = i * step;
    if (best && d >= best.cost) break;
    const far = d > r.h;
    const candidates: [Box, number][] = [
      [spot(r, r.prefer, d, gap), d],
      [spot(r, other, d, gap), d + otherSide],
      [side(r, 'right', d, gap), d + beside],
      [side(r, 'right', -d, gap), d + beside],
      [side(r, 'left', d, gap), d + beside],
      [side(r, 'left', -d, gap), d + beside],
    ];
    for (const [raw, base] of candidates) {
      if (best && base >= best.cost) continue;
      // Slide a label sideways into the bounds rather than lose a spot next to its bar.
      const box = { ...raw, x: Math.min(Math.max(raw.x, bounds.x), bounds.x + bounds.w - raw.w) };
      if (!inside(box, bounds) || !free(box)) continue;
      const cost = base + (crossesSoft(box) ? soft : 0);
      if (!best || cost < best.cost) best = { placement: { box, displaced: far }, cost };
    }
  }
  return best?.placement;
}

function spot(r: LabelRequest, where: 'above' | 'below', d: number, gap: number): Box {
  const y = where === 'above' ? r.y - 2 * gap - r.h - d : r.y + 2 * gap + d;
  return { x: r.x - r.w / 2, y, w: r.w, h: r.h };
}

function side(r: LabelRequest, where: 'left' | 'right', d: number, gap: number): Box {
  const x = where === 'right' ? r.x + r.halfWidth + 2 * gap : r.x - r.halfWidth - 2 * gap - r.w;
  return { x, y: r.y - r.h / 2 + d, w: r.w, h: r.h };
}
