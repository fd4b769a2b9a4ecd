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
 * Greedy, deterministic placement: labels are taken in the order given; each tries spots
 * at growing distance from its bar — preferred side, other side, then right and left of
 * the bar — and takes the first whose box (grown by `gap`) touches no bar and no label
 * placed before it, inside `bounds`; spots close to the bar that also miss the soft
 * obstacles are tried first. If nothing fits inside, the label goes just above
 * everything (outside the bounds but still clear), so boxes never overlap.
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: Obstacles, bounds: Box, gap: number, step = 0.5): Placement[] {
  const cell = Math.max(2, ...requests.slice(0, 50).map((r) => r.w));
  const hard = boxIndex(cell);
  const soft = boxIndex(cell);
  obstacles.hard.forEach(hard.add);
  obstacles.soft.forEach(soft.add);
  return requests.map((r) => {
    const home = spot(r, r.prefer, 0, gap);
    let placement: Placement;
    if (r.fixed) placement = { box: { ...home, x: home.x + r.fixed.dx, y: home.y + r.fixed.dy }, displaced: false };
    else {
      const clear = (b: Box) => !hard.hits(b, gap);
      const found = search(r, bounds, gap, step, 2 * r.h, (b) => clear(b) && !soft.hits(b, 0)) ?? search(r, bounds, gap, step, bounds.h + r.h, clear);
      placement = found ?? { box: { ...home, y: Math.min(hard.top(), bounds.y) - 2 * gap - r.h }, displaced: true };
    }
    hard.add(placement.box);
    return placement;
  });
}

function search(r: LabelRequest, bounds: Box, gap: number, step: number, reach: number, free: (b: Box) => boolean): Placement | undefined {
  const other = r.prefer === 'above' ? 'below' : 'above';
  const limit = Math.ceil(reach / step);
  for (let i = 0; i <= limit; i++) {
    const d = i * step;
    const far = d > r.h;
    const candidates: Placement[] = [
      { box: spot(r, r.prefer, d, gap), displaced: far },
      { box: spot(r, other, d, gap), displaced: far },
      { box: side(r, 'right', d, gap), displaced: far },
      { box: side(r, 'right', -d, gap), displaced: far },
      { box: side(r, 'left', d, gap), displaced: far },
      { box: side(r, 'left', -d, gap), displaced: far },
    ];
    for (const c of candidates) if (inside(c.box, bounds) && free(c.box)) return c;
  }
  return undefined;
}

function spot(r: LabelRequest, where: 'above' | 'below', d: number, gap: number): Box {
  const y = where === 'above' ? r.y - 2 * gap - r.h - d : r.y + 2 * gap + d;
  return { x: r.x - r.w / 2, y, w: r.w, h: r.h };
}

function side(r: LabelRequest, where: 'left' | 'right', d: number, gap: number): Box {
  const x = where === 'right' ? r.x + r.halfWidth + 2 * gap : r.x - r.halfWidth - 2 * gap - r.w;
  return { x, y: r.y - r.h / 2 + d, w: r.w, h: r.h };
}
