import { boxIndex } from './boxIndex.ts';
import { cheapestSpot, spotSearch, type SpotLine, type SpotSearch } from './cheapestSpot.ts';
import { columnIndex } from './columnIndex.ts';
import type { Box } from './scene.ts';

/** A label to place next to its level bar (or beside an annotation's arrow). */
export interface LabelRequest {
  /** Bar centre and half width, mm. */
  x: number;
  y: number;
  halfWidth: number;
  w: number;
  h: number;
  /** Where the label would rather sit: above or below the bar, or beside it (right first). */
  prefer: 'above' | 'below' | 'beside';
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
 * spots at growing distance from its bar — above and below, then right and left of it
 * (for `beside`, right and left first) — and takes the cheapest whose box (grown by
 * `gap`) touches no bar and no label placed before it and lies inside `bounds`. Cost grows
 * with the distance; the non-preferred side, a spot off the preferred side and crossing a
 * soft obstacle (a connector) cost extra. A label with no clear spot inside gets null: it
 * is left out (and takes no room from later labels), so every placed box lies inside the
 * bounds and no two overlap. A `fixed` label goes where the user put it, even outside.
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: Obstacles, bounds: Box, gap: number, step = 0.5): (Placement | null)[] {
  const cell = Math.max(2, ...requests.slice(0, 50).map((r) => r.w));
  const hard = boxIndex(cell);
  const columns = columnIndex(cell);
  const soft = boxIndex(cell);
  for (const b of obstacles.hard) {
    hard.add(b);
    columns.add(b);
  }
  obstacles.soft.forEach(soft.add);
  const at = spotSearch(hard, columns, soft);
  const lines = Array.from({ length: 6 }, (): SpotLine => ({ x: 0, y0: 0, dir: 1, extra: 0 }));
  return requests.map((r) => {
    const home = r.prefer === 'beside' ? side(r, 'right', gap) : spot(r, r.prefer, gap);
    const placement = r.fixed
      ? { box: { ...home, x: home.x + r.fixed.dx, y: home.y + r.fixed.dy }, displaced: false }
      : cheapest(r, bounds, gap, step, at, lines);
    if (!placement) return null;
    hard.add(placement.box);
    columns.add(placement.box);
    return placement;
  });
}

function cheapest(r: LabelRequest, bounds: Box, gap: number, step: number, at: SpotSearch, lines: SpotLine[]): Placement | undefined {
  step = Math.max(step, r.h / 3);
  const limit = Math.ceil((bounds.h + r.h) / step);
  candidateLines(r, gap, bounds, lines);
  const found = cheapestSpot(lines, r.w, r.h, bounds, gap, step, limit, at);
  return found && { box: found.box, displaced: found.distance > r.h };
}

/**
 * Fills the six candidate lines in order of preference, with their extra cost (multiples
 * of the label height, our tuning). Written into `out` since this runs once per label.
 */
function candidateLines(r: LabelRequest, gap: number, bounds: Box, out: SpotLine[]): void {
  const otherSide = 0.3 * r.h;
  const beside = 2 * r.h;
  const centre = r.x - r.w / 2;
  const right = r.x + r.halfWidth + 2 * gap;
  const left = r.x - r.halfWidth - 2 * gap - r.w;
  const level = r.y - r.h / 2;
  const above = r.y - 2 * gap - r.h;
  const below = r.y + 2 * gap;
  const set = (k: number, x: number, y0: number, dir: 1 | -1, extra: number) => {
    const line = out[k]!;
    // Slide a label sideways into the bounds rather than lose a spot next to its bar.
    line.x = Math.min(Math.max(x, bounds.x), bounds.x + bounds.w - r.w);
    line.y0 = y0;
    line.dir = dir;
    line.extra = extra;
  };
  if (r.prefer === 'beside') {
    set(0, right, level, 1, 0);
    set(1, right, level, -1, 0);
    set(2, left, level, 1, otherSide);
    set(3, left, level, -1, otherSide);
    set(4, centre, above, -1, beside);
    set(5, centre, below, 1, beside);
    return;
  }
  const [near, far] = r.prefer === 'above' ? [above, below] : [below, above];
  const dir = r.prefer === 'above' ? -1 : 1;
  set(0, centre, near, dir, 0);
  set(1, centre, far, dir === 1 ? -1 : 1, otherSide);
  set(2, right, level, 1, beside);
  set(3, right, level, -1, beside);
  set(4, left, level, 1, beside);
  set(5, left, level, -1, beside);
}

function spot(r: LabelRequest, where: 'above' | 'below', gap: number): Box {
  const y = where === 'above' ? r.y - 2 * gap - r.h : r.y + 2 * gap;
  return { x: r.x - r.w / 2, y, w: r.w, h: r.h };
}

function side(r: LabelRequest, where: 'left' | 'right', gap: number): Box {
  const x = where === 'right' ? r.x + r.halfWidth + 2 * gap : r.x - r.halfWidth - 2 * gap - r.w;
  return { x, y: r.y - r.h / 2, w: r.w, h: r.h };
}
