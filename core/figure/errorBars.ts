import type { LayoutPathway } from './collectPoints.ts';
import type { FigureContext } from './figureContext.ts';
import type { PlacedLevel } from './levels.ts';
import { pathPieces } from './pathPieces.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import type { PathItem } from './scene.ts';
import { fromJoulesPerMol, type EnergyUnit } from '../units/energy.ts';

/** Lower and upper end of a level's error bar, in J/mol on the profile's scale. */
export interface EnergyRange { low: number; high: number }

/** Error bars by level, keyed by `errorBarKey(pathway, point)`. */
export type ErrorBarRanges = ReadonlyMap<string, EnergyRange>;

/** The key of a level in `ErrorBarRanges`. */
export const errorBarKey = (pathway: string, point: string) => `${pathway}\u0000${point}`;

/** Thickness of a whisker as a share of its level's bar (our choice: reads as a thin line beside the bar). */
const WHISKER_SHARE = 1 / 3;
/** Longest half width of a cap, mm (our choice). */
const MAX_CAP_MM = 1.2;

/** The ends of one level's bar in the display unit, or undefined where it has none. */
function barEnds(ranges: ErrorBarRanges, unit: EnergyUnit, pathwayId: string, pointId: string): { low: number; high: number } | undefined {
  const r = ranges.get(errorBarKey(pathwayId, pointId));
  return r ? { low: fromJoulesPerMol(r.low, unit), high: fromJoulesPerMol(r.high, unit) } : undefined;
}

/**
 * The ends of the bars of the drawn levels (known energy, visible pathway), in the
 * display unit, so the energy scale can reach them.
 */
export function errorBarEnergies(pathways: readonly LayoutPathway[], ranges: ErrorBarRanges, unit: EnergyUnit): number[] {
  if (ranges.size === 0) return [];
  return pathways.flatMap((p) => p.points.flatMap((q) => {
    const ends = q.energy === null ? undefined : barEnds(ranges, unit, p.id, q.pointId);
    return ends ? [ends.low, ends.high] : [];
  }));
}

/** Each level with its bar's ends (`low`, `high`, display unit) where it has a bar. */
export function withErrorBarEnds<T extends { pathwayId: string; pointId: string }>(points: readonly T[], ranges: ErrorBarRanges, unit: EnergyUnit): (T & { low?: number; high?: number })[] {
  if (ranges.size === 0) return [...points];
  return points.map((q) => ({ ...q, ...barEnds(ranges, unit, q.pathwayId, q.pointId) }));
}

/**
 * A vertical error bar with caps through the centre of each level that has a range, in the
 * level's colour, on the layout's own scale `y` (display unit → mm). Each level comes back
 * with `errorBar`: the boxes its bar covers (stroke included), which label placement counts
 * as part of that level.
 */
export function errorBarItems(ctx: FigureContext, placed: readonly PlacedLevel[], ranges: ErrorBarRanges, paints: ReadonlyMap<number, PathwayPaint>, unit: EnergyUnit, y: (energy: number) => number): { items: PathItem[]; placed: PlacedLevel[] } {
  if (ranges.size === 0) return { items: [], placed: [...placed] };
  const items: PathItem[] = [];
  const out = placed.map((level) => {
    const range = ranges.get(errorBarKey(level.point.pathwayId, level.point.pointId));
    const paint = paints.get(level.point.pathwayIndex);
    if (!range || !paint) return level;
    const { x } = level;
    const cap = Math.min(level.halfWidth / 2, MAX_CAP_MM);
    const top = y(fromJoulesPerMol(range.high, unit));
    const bottom = y(fromJoulesPerMol(range.low, unit));
    const stroke = { colour: paint.colour, widthMm: WHISKER_SHARE * paint.weight * ctx.strokeMm, cap: 'butt' as const };
    const segments: PathItem['segments'] = [
      { op: 'M', x, y: top }, { op: 'L', x, y: bottom },
      { op: 'M', x: x - cap, y: top }, { op: 'L', x: x + cap, y: top },
      { op: 'M', x: x - cap, y: bottom }, { op: 'L', x: x + cap, y: bottom },
    ];
    items.push({ kind: 'path', role: 'errorBar', pathway: level.point.pathwayId, point: level.point.pointId, stroke, segments });
    return { ...level, errorBar: pathPieces(segments, stroke.widthMm / 2, 1) };
  });
  return { items, placed: out };
}
