import { boxIndex, type BoxIndex } from './boxIndex.ts';
import { cheapestSpot, spotSearch, type SpotJudge, type SpotLine, type SpotSearch } from './cheapestSpot.ts';
import { columnIndex } from './columnIndex.ts';
import { eachPiece, pathPieces } from './pathPieces.ts';
import type { Box } from './scene.ts';
import { boxDistance, growBox } from './geometry.ts';

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
  /** For a label standing for a stack of levels at one slot: the top and bottom bars' y (default y). */
  yTop?: number;
  yBottom?: number;
  /**
   * Bars of the levels this label names (boxes also listed in `Obstacles.bars`). When
   * given, a spot counts as next to its level only when no other bar is nearer and no
   * obstacle lies between; any other spot needs a leader line that crosses no label.
   */
  own?: readonly Box[];
  /**
   * Boxes drawn as part of those levels (their error bars, also listed in `Obstacles.bars`):
   * a spot next to them is next to its level, as beside `own`; leaders still start at a bar of `own`.
   */
  attached?: readonly Box[];
  /** How far along its line a label may move and still count as next to its level (default h). */
  nearMm?: number;
  /** A spot whose box lies farther than this from its nearest own bar needs a leader line (default: no limit). */
  farMm?: number;
}

/** A straight leader line from a level to its label, mm. */
export interface Leader {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Where a label went, and whether it sits away from its bar (then `leader` joins them). */
export interface Placement {
  box: Box;
  displaced: boolean;
  leader?: Leader;
}

/**
 * What labels keep clear of: `hard` always (bars, connectors, any drawn primitive),
 * `soft` when a nearby spot allows; `bars` are the level bars among `hard`, against which
 * a label's own level is judged.
 */
export interface Obstacles {
  hard: readonly Box[];
  soft: readonly Box[];
  bars?: readonly Box[];
}

/** Extra cost of a spot that needs a leader line, in label heights (our tuning). */
const LEADER_COST = 1.5;
/**
 * Where along a half bar a leader starts when the level has an error bar through its centre
 * (our choice): well past the cap, whose half width is at most half the bar's (errorBars.ts),
 * and short of the bar's end, where connectors leave.
 */
const LEADER_OFFSET = 0.8;

function overlapsBox(b: Box, x: number, y: number, w: number, h: number): boolean {
  return b.x < x + w && x < b.x + b.w && b.y < y + h && y < b.y + b.h;
}

/**
 * Greedy, deterministic placement: labels are taken in the order given; each looks at
 * spots at growing distance from its bar — above and below (centred, then aligned with
 * either end of the bar), then right and left of it (for `beside`, right and left first)
 * — and takes the cheapest whose box (grown by `gap`) touches no hard obstacle and no
 * label or leader placed before it and lies inside `bounds`. Cost grows with the
 * distance; the non-preferred side, a shifted or side spot, crossing a soft obstacle and
 * needing a leader cost extra. A label with no clear spot inside gets null: it is left
 * out (and takes no room from later labels). A `fixed` label goes where the user put it.
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: Obstacles, bounds: Box, gap: number, step = 0.5): (Placement | null)[] {
  const cell = Math.max(2, ...requests.slice(0, 50).map((r) => r.w));
  const hard = boxIndex(cell);
  const columns = columnIndex(cell);
  const soft = boxIndex(cell);
  const bars = boxIndex(cell);
  const texts = boxIndex(cell);
  const block = (b: Box) => {
    hard.add(b);
    columns.add(b);
  };
  obstacles.hard.forEach(block);
  obstacles.soft.forEach(soft.add);
  obstacles.bars?.forEach(bars.add);
  const at = spotSearch(hard, columns, soft);
  const lines = Array.from({ length: 10 }, (): SpotLine => ({ x: 0, y0: 0, dir: 1, extra: 0 }));
  return requests.map((r) => {
    const home = r.prefer === 'beside' ? side(r, 'right', gap) : spot(r, r.prefer, gap);
    const placement = r.fixed
      ? { box: { ...home, x: home.x + r.fixed.dx, y: home.y + r.fixed.dy }, displaced: false }
      : cheapest(r, bounds, gap, step, at, lines, bars, texts);
    if (!placement) return null;
    block(placement.box);
    texts.add(placement.box);
    if (placement.leader) {
      const { x0, y0, x1, y1 } = placement.leader;
      pathPieces([{ op: 'M', x: x0, y: y0 }, { op: 'L', x: x1, y: y1 }], 0.1, 4).forEach(block);
    }
    return placement;
  });
}

function cheapest(r: LabelRequest, bounds: Box, gap: number, step: number, at: SpotSearch, lines: SpotLine[], bars: BoxIndex, texts: BoxIndex): Placement | undefined {
  step = Math.max(step, r.h / 3);
  const limit = Math.ceil((bounds.h + r.h) / step);
  const n = candidateLines(r, gap, bounds, lines);
  const judge = r.own ? ownLevelJudge(r, r.own, gap, at.hard, bars, texts) : undefined;
  const found = cheapestSpot(n < lines.length ? lines.slice(0, n) : lines, r.w, r.h, bounds, gap, step, limit, at, judge?.cost);
  if (!found) return undefined;
  if (!judge) return { box: found.box, displaced: found.distance > r.h };
  const leader = judge.leader(found.box, found.distance);
  return leader ? { box: found.box, displaced: true, leader } : { box: found.box, displaced: false };
}

/**
 * Judges spots of a level label: next to its level (nothing nearer, nothing between, not
 * far) costs nothing; otherwise a leader from the nearest own bar's centre is needed, which
 * must cross no placed label.
 */
function ownLevelJudge(r: LabelRequest, own: readonly Box[], gap: number, hard: BoxIndex, bars: BoxIndex, texts: BoxIndex): { cost: SpotJudge; leader: (box: Box, distance: number) => Leader | undefined } {
  const parts = r.attached && r.attached.length > 0 ? [...own, ...r.attached] : own;
  const mine = new Set(parts);
  const leaderFor = (box: Box, distance: number): Leader | undefined | null => {
    const nearestOf = (boxes: readonly Box[]) => {
      let best = boxes[0]!;
      let bestD = Infinity;
      for (const b of boxes) {
        const d = boxDistance(box, b);
        if (d < bestD) [bestD, best] = [d, b];
      }
      return { box: best, d: bestD };
    };
    const { box: nearestPart, d: ownD } = nearestOf(parts);
    let next = distance <= (r.nearMm ?? r.h) && ownD <= (r.farMm ?? Infinity);
    if (next) next = !bars.touching(growBox(box, ownD)).some((b) => !mine.has(b) && boxDistance(box, b) < ownD - 1e-3);
    const clearTo = (part: Box) => {
      const gapBox = between(box, part, gap);
      return !gapBox || hard.touching(gapBox).every((b) => mine.has(b));
    };
    const nearest = parts === own ? nearestPart : nearestOf(own).box;
    // Beside its own error bar, the label must also see its level past the bar: a connector
    // crossing the bar between them would make the label read as another level's (the audit's rule).
    if (next) next = clearTo(nearestPart) && (nearest === nearestPart || clearTo(nearest));
    if (next) return undefined;
    const centre = nearest.x + nearest.w / 2;
    const y0 = nearest.y + nearest.h / 2;
    // A leader from the bar's centre would run along the level's own error bar: start it
    // part way to the bar's end instead, on the label's side first.
    const toward = Math.sign(box.x + box.w / 2 - centre) || 1;
    const starts = parts === own ? [centre] : [centre, centre + toward * LEADER_OFFSET * nearest.w / 2, centre - toward * LEADER_OFFSET * nearest.w / 2];
    for (const x0 of starts) {
      const x1 = Math.min(Math.max(x0, box.x), box.x + box.w);
      const y1 = Math.min(Math.max(y0, box.y), box.y + box.h);
      const line = [{ op: 'M' as const, x: x0, y: y0 }, { op: 'L' as const, x: x1, y: y1 }];
      if (parts !== own && eachPiece(line, 0, 8, (x, y, w, h) => r.attached!.some((b) => overlapsBox(b, x, y, w, h)))) continue;
      return eachPiece(line, 0, 8, (x, y, w, h) => texts.hitsAt(x, y, w, h, gap)) ? null : { x0, y0, x1, y1 };
    }
    return null;
  };
  return {
    cost: (x, y, distance) => {
      const leader = leaderFor({ x, y, w: r.w, h: r.h }, distance);
      return leader === undefined ? 0 : leader === null ? Infinity : LEADER_COST * r.h;
    },
    leader: (box, distance) => leaderFor(box, distance) ?? undefined,
  };
}

/** The space between a label and a bar, shrunk by `inset` across (so the bar's own connectors at its ends stay out); null when none. */
function between(a: Box, b: Box, inset: number): Box | null {
  const x0 = Math.max(a.x, b.x) + inset;
  const x1 = Math.min(a.x + a.w, b.x + b.w) - inset;
  if (x1 > x0) {
    const [top, bottom] = a.y + a.h <= b.y ? [a.y + a.h, b.y] : [b.y + b.h, a.y];
    return bottom - top > 0.1 ? { x: x0, y: top + 0.05, w: x1 - x0, h: bottom - top - 0.1 } : null;
  }
  const y0 = Math.max(a.y, b.y);
  const y1 = Math.min(a.y + a.h, b.y + b.h);
  if (y1 <= y0) return null;
  const [left, right] = a.x + a.w <= b.x ? [a.x + a.w, b.x] : [b.x + b.w, a.x];
  return right - left > 0.1 ? { x: left + 0.05, y: y0, w: right - left - 0.1, h: y1 - y0 } : null;
}



/**
 * Fills the candidate lines in order of preference, with their extra cost (multiples of
 * the label height, our tuning); returns how many were filled. Written into `out` since
 * this runs once per label.
 */
function candidateLines(r: LabelRequest, gap: number, bounds: Box, out: SpotLine[]): number {
  const otherSide = 0.3 * r.h;
  const shifted = 0.15 * r.h;
  const beside = 2 * r.h;
  const centre = r.x - r.w / 2;
  const right = r.x + r.halfWidth + 2 * gap;
  const left = r.x - r.halfWidth - 2 * gap - r.w;
  const top = r.yTop ?? r.y;
  const bottom = r.yBottom ?? r.y;
  const level = (top + bottom) / 2 - r.h / 2;
  // Above and below start past the level's own error bars: a spot on the bar is never clear,
  // and the search's steps (a third of the label's height) would overshoot the bar's end.
  const attached = r.attached ?? [];
  const above = Math.min(top, ...attached.map((b) => b.y)) - 2 * gap - r.h;
  const below = Math.max(bottom, ...attached.map((b) => b.y + b.h)) + 2 * gap;
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
    return 6;
  }
  const [near, far] = r.prefer === 'above' ? [above, below] : [below, above];
  const dir = r.prefer === 'above' ? -1 : 1;
  // Aligned with the bar's left or right end: clear of a connector leaving the other end.
  const alignLeft = r.x - r.halfWidth;
  const alignRight = r.x + r.halfWidth - r.w;
  set(0, centre, near, dir, 0);
  set(1, centre, far, dir === 1 ? -1 : 1, otherSide);
  set(2, alignLeft, near, dir, shifted);
  set(3, alignRight, near, dir, shifted);
  set(4, alignLeft, far, dir === 1 ? -1 : 1, otherSide + shifted);
  set(5, alignRight, far, dir === 1 ? -1 : 1, otherSide + shifted);
  set(6, right, level, 1, beside);
  set(7, right, level, -1, beside);
  set(8, left, level, 1, beside);
  set(9, left, level, -1, beside);
  return 10;
}

function spot(r: LabelRequest, where: 'above' | 'below', gap: number): Box {
  const y = where === 'above' ? (r.yTop ?? r.y) - 2 * gap - r.h : (r.yBottom ?? r.y) + 2 * gap;
  return { x: r.x - r.w / 2, y, w: r.w, h: r.h };
}

function side(r: LabelRequest, where: 'left' | 'right', gap: number): Box {
  const x = where === 'right' ? r.x + r.halfWidth + 2 * gap : r.x - r.halfWidth - 2 * gap - r.w;
  return { x, y: r.y - r.h / 2, w: r.w, h: r.h };
}
