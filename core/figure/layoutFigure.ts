import type { Document } from '../model/schema.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import { planAnnotations, planEnergies } from './annotationPlans.ts';
import { annotationShapes } from './annotationShapes.ts';
import { arrowBandHeight, coordinateArrow } from './coordinateArrow.ts';
import { axisBandWidth, axisItems } from './axis.ts';
import { collectPoints, type LayoutPoint } from './collectPoints.ts';
import { energyScale } from './energyScale.ts';
import { figureContext } from './figureContext.ts';
import type { FontMetrics } from './font/fontMetrics.ts';
import { labels } from './labels.ts';
import { labelBlock, namesBlock } from './labelBlock.ts';
import { legend } from './legend.ts';
import { levels, type PlacedLevel } from './levels.ts';
import { pathwayPaint, type PathwayPaint } from './pathwayPaint.ts';
import { figureSize, PRESETS, type Preset } from './presets.ts';
import type { Scene, SceneItem } from './scene.ts';
import { sceneObstacles } from './sceneObstacles.ts';
import { inLayerOrder } from './sceneLayers.ts';
import { THEMES, type ThemeName } from './themes.ts';
import type { PointDrawing } from '../structure/pointDepictions.ts';
import { grownHeight, structureLayer, structureRoom } from './structures/structureLayer.ts';
import { energyDecimals } from '../format/energyDecimals.ts';
import { errorBarEnergies, errorBarItems, withErrorBarEnds, type ErrorBarRanges } from './errorBars.ts';

/** Text keeps at least this far inside the page (issue 11's rule: 1 mm; a little more for rounding). */
export const PAGE_MARGIN_MM = 1.2;

/** Options that are not in the document, or override it for one export. */
export interface LayoutOptions {
  /** Metrics of the font every output will embed (see readFontMetrics). */
  metrics: FontMetrics;
  preset?: Preset;
  widthMm?: number;
  heightMm?: number;
  theme?: ThemeName;
  /** Lower digits in formula-like words of labels (H2O → H₂O). Default false. */
  autoSubscript?: boolean;
  /** Molecule drawings by point (see pointDepictions); none when absent. */
  structures?: ReadonlyMap<string, PointDrawing>;
  /** Error bars by level (see errorBars.ts): drawn on the layout's scale, inside it, and kept clear by labels. */
  errorBars?: ErrorBarRanges;
}

/**
 * Lays a resolved profile out as a scene in mm: levels at shared slots, connectors,
 * labels placed clear of bars and of each other (those left no room on the page are left
 * out and listed in `omittedLabels`), y axis, reaction-coordinate arrow and
 * legend, and the document's annotations (barrier arrows, energetic span brackets, free
 * text; see annotationPlans.ts and annotationShapes.ts; ones that cannot be drawn are left
 * out, and `annotationFindings` says why), all per the document's figure settings. Deterministic: the same inputs give
 * the same scene.
 */
export function layoutFigure(profile: ResolvedProfile, doc: Document, options: LayoutOptions): Scene {
  const fig = doc.figure;
  const theme = THEMES[options.theme ?? fig.theme];
  const preset = options.preset ?? fig.preset;
  const given = figureSize(preset, options.widthMm ?? fig.widthMm, options.heightMm ?? fig.heightMm);
  const drawings = options.structures ?? new Map<string, PointDrawing>();
  const room = structureRoom(figureContext(doc, profile.unit, options.metrics, theme, given, false, PRESETS[preset].textScale), drawings, PRESETS[preset].textScale);
  const size = { ...given, heightMm: grownHeight(given, (options.heightMm ?? fig.heightMm) !== undefined, preset, room) };
  const ctx = figureContext(doc, profile.unit, options.metrics, theme, size, options.autoSubscript ?? false, PRESETS[preset].textScale);
  const pathways = collectPoints(profile, doc);
  const paints = pathways.map((p) => pathwayPaint(p.index, doc.pathways.find((d) => d.id === p.id)?.style, theme, fig.connector));
  const margin = 2 * ctx.gapMm + 0.5 * ctx.sizeMm;

  const known = pathways.flatMap((p) => p.points).filter((q): q is LayoutPoint & { energy: number } => q.energy !== null);
  const plans = planAnnotations(profile, doc, pathways).plans;
  const ranges = options.errorBars ?? new Map();
  const energies = [...known.map((q) => q.energy), ...planEnergies(plans), ...errorBarEnergies(pathways, ranges, profile.unit)];
  // Every tick density the final scale may choose, so the band fits its widest number.
  const tickLabels = [1, 2, 3, 4, 5].flatMap((count) => {
    const probe = energyScale(energies, 1, 0, count);
    return probe.ticks.map(probe.format);
  });
  const left = fig.showAxis ? margin + axisBandWidth(ctx, tickLabels) : margin;
  const x1 = size.widthMm - margin;
  const top = fig.showLegend ? margin : 0;
  const key = fig.showLegend ? legend(ctx, pathways, paints, left, x1, top) : { items: [], heightMm: 0 };
  const y0 = Math.max(margin, top + key.heightMm);
  const y1 = size.heightMm - (fig.showCoordinateArrow ? arrowBandHeight(ctx) + margin / 2 + PAGE_MARGIN_MM : margin);
  const plot = { x: left, y: y0, w: x1 - left, h: y1 - y0 };

  // Room for a label above the highest and below the lowest level.
  const style = { ...ctx, decimals: energyDecimals(doc.settings, ctx.unit), energyFormat: fig.energyFormat, daggerOnTs: fig.daggerOnTs };
  const measured = new Map(known.slice(0, 200).map((q) => [q, labelBlock(q.label, q.kind, q.energy, style)] as const));
  const tallest = Math.max(0, ...[...measured.values()].map((b) => b.h));
  const stacked = stackDepth(known);
  const stackPoints = withErrorBarEnds(known, ranges, profile.unit);
  const twinHeight = (names: string[], twin: StackPoint) => namesBlock(names, twin.kind, twin.energy, style).h;
  const pad = (lines: number) => Math.max(tallest, lines * ctx.lineMm) + 3 * ctx.gapMm;
  let bottomMm = y1 - pad(stacked.bottom) - room.below;
  let topMm = y0 + pad(stacked.top) + room.above;
  let scale = energyScale(energies, bottomMm, topMm, 5, 1.5 * ctx.lineMm);
  // Stacks are joined by mm, not energy: measure them on this scale, and where the stack at
  // a slot's top (bottom) reaches past the plot, leave it the room. A level inside the
  // range moves by only part of the room given, and the new scale may join one more level:
  // a few passes (our choice) bring the shortfall under a tenth of a millimetre.
  for (let pass = 0; pass < 5; pass++) {
    const short = stackShortfall(stackPoints, scale.y, { top: y0, bottom: y1, join: tallest + 6 * ctx.gapMm, line: STACK_LINE * ctx.lineMm, gap: 3 * ctx.gapMm, twinHeight });
    const up = Math.max(0, short.top);
    const down = Math.max(0, short.bottom);
    if (up + down <= 1e-3) break;
    // The levels keep at least a quarter of the plot; the room is shared in proportion.
    const spare = bottomMm - topMm - MIN_LEVEL_SPAN * (y1 - y0);
    if (spare <= 1e-3) break;
    const k = Math.min(1, spare / (up + down));
    topMm += k * up;
    bottomMm -= k * down;
    scale = energyScale(energies, bottomMm, topMm, 5, 1.5 * ctx.lineMm);
  }

  const slots = pathways.flatMap((p) => p.points.map((q) => q.slot));
  const lo = Math.min(0, ...slots);
  const spacing = plot.w / (Math.max(0, ...slots) - lo + 1);
  const defaultHalf = Math.min(0.3 * spacing, 7);
  const place = (q: LayoutPoint): PlacedLevel | null => q.energy === null ? null : {
    point: q, x: plot.x + (q.slot - lo + 0.5) * spacing, y: scale.y(q.energy), halfWidth: q.barWidthMm !== undefined ? q.barWidthMm / 2 : defaultHalf,
  };

  const items: SceneItem[] = [];
  if (fig.showAxis) items.push(...axisItems(ctx, scale, plot.x, margin));
  const placed: PlacedLevel[] = [];
  pathways.forEach((p, i) => {
    const drawn = levels(ctx, p, paints[i]!, place);
    items.push(...drawn.items);
    placed.push(...drawn.placed);
  });
  const paintByIndex = new Map<number, PathwayPaint>(pathways.map((p, i) => [p.index, paints[i]!]));
  const byId = new Map(placed.map((l) => [`${l.point.pathwayId}\u0000${l.point.pointId}`, l]));
  const marks = annotationShapes(ctx, plans, {
    level: (pathway, point) => byId.get(`${pathway}\u0000${point}`),
    slotX: (slot) => plot.x + (slot - lo + 0.5) * spacing,
    y: scale.y,
  });
  items.push(...marks.items);
  // Labels may reach into the right margin, never over the axis, and keep the page margin.
  const labelBounds = { ...plot, x: plot.x + 2 * ctx.gapMm, w: size.widthMm - PAGE_MARGIN_MM - plot.x - 2 * ctx.gapMm };
  // Everything drawn so far is an obstacle, whatever it is (see sceneObstacles).
  // sceneObstacles skips error bars like levels: labels file them as parts of their levels.
  const bars = errorBarItems(ctx, placed, ranges, paintByIndex, profile.unit, scale.y);
  items.push(...bars.items);
  const placedLabels = labels(ctx, bars.placed, paintByIndex, labelBounds, sceneObstacles(items), marks, measured);
  items.push(...placedLabels.items);
  const molecules = structureLayer(ctx, placed, items, drawings, room, placedLabels.boxes, { ...labelBounds, w: labelBounds.w - ctx.gapMm });
  items.push(...molecules.items);
  items.push(...key.items);
  if (fig.showCoordinateArrow) items.push(...coordinateArrow(ctx, plot.x, x1, y1 + margin / 2));
  // Layer order (connectors under levels under labels, …) so the canvas, SVG and PDF stack alike.
  return { widthMm: size.widthMm, heightMm: size.heightMm, background: theme.background, fontFamily: options.metrics.family, items: inLayerOrder(items), omittedLabels: [...placedLabels.omitted, ...molecules.omitted] };
}

/** Height of one line of a stacked label in text line heights: raised marks (‡, superscripts) and the air between lines (our allowance, see stackBlock). */
const STACK_LINE = 1.2;
/** Least share of the plot height the levels span when stacked labels claim room at its ends (our choice). */
const MIN_LEVEL_SPAN = 0.4;

/**
 * How far the stacked label above each slot's top level (below its bottom level) would
 * reach past the plot's top (bottom), at most, in mm: levels of one slot closer than `join`
 * mm join one stack (as labels.ts joins them), a stack takes `line` mm a level plus `gap`
 * (twins under several names: their measured names block, `twinHeight`), and starts beyond
 * the ends of its levels' error bars (`high`/`low`, display unit), which it keeps clear of.
 * Negative when every stack fits. One sort per slot, no pairwise work.
 */
function stackShortfall(
  points: readonly StackPoint[], y: (e: number) => number,
  o: { top: number; bottom: number; join: number; line: number; gap: number; twinHeight: (names: string[], twin: StackPoint) => number },
): { top: number; bottom: number } {
  // Twins (one spot, y to 0.01 mm) print one label; a spot reaches as far as its bars do.
  type Spot = { at: number; above: number; below: number; names: Set<string>; first: StackPoint };
  const bySlot = new Map<number, Map<number, Spot>>();
  for (const q of points) {
    const at = Math.round(y(q.energy) * 100) / 100;
    const spots = bySlot.get(q.slot) ?? new Map<number, Spot>();
    const spot = spots.get(at) ?? { at, above: at, below: at, names: new Set<string>(), first: q };
    spot.above = Math.min(spot.above, y(q.high ?? q.energy));
    spot.below = Math.max(spot.below, y(q.low ?? q.energy));
    if (q.label.trim() !== '') spot.names.add(q.label);
    spots.set(at, spot);
    bySlot.set(q.slot, spots);
  }
  const height = (spot: Spot) => (spot.names.size > 1 ? Math.max(o.line, o.twinHeight([...spot.names], spot.first)) : o.line);
  let top = -Infinity;
  let bottom = -Infinity;
  for (const spots of bySlot.values()) {
    const sorted = [...spots.values()].sort((a, b) => a.at - b.at);
    let n = 1;
    while (n < sorted.length && sorted[n]!.at - sorted[n - 1]!.at < o.join) n++;
    const upper = sorted.slice(0, n);
    top = Math.max(top, upper.reduce((h, s) => h + height(s), 0) + o.gap - (Math.min(...upper.map((s) => s.above)) - o.top));
    let m = 1;
    while (m < sorted.length && sorted[sorted.length - m]!.at - sorted[sorted.length - m - 1]!.at < o.join) m++;
    const lower = sorted.slice(sorted.length - m);
    bottom = Math.max(bottom, lower.reduce((h, s) => h + height(s), 0) + o.gap - (o.bottom - Math.max(...lower.map((s) => s.below))));
  }
  return { top, bottom };
}

/** A drawn level for stackShortfall: its slot, energy and error bar ends (display unit). */
interface StackPoint { slot: number; energy: number; label: string; kind: 'min' | 'ts'; low?: number; high?: number }

/**
 * How many levels may stack into one label at the top and at the bottom of the plot: the
 * most levels one slot has within a tenth of the energy range of the highest (lowest)
 * level (our rule of thumb), so the scale leaves room for a stacked label there.
 */
function stackDepth(points: readonly { slot: number; energy: number }[]): { top: number; bottom: number } {
  if (points.length === 0) return { top: 0, bottom: 0 };
  const energies = points.map((q) => q.energy);
  const [lo, hi] = [Math.min(...energies), Math.max(...energies)];
  const near = 0.1 * (hi - lo);
  const most = (keep: (e: number) => boolean) => {
    const counts = new Map<number, number>();
    for (const q of points) if (keep(q.energy)) counts.set(q.slot, (counts.get(q.slot) ?? 0) + 1);
    return Math.max(0, ...counts.values());
  };
  return { top: most((e) => e >= hi - near), bottom: most((e) => e <= lo + near) };
}
