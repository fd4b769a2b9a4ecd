import type { LayoutPoint } from './collectPoints.ts';
import type { FigureContext } from './figureContext.ts';
import { blockItems, labelBlock, namesBlock, type LabelBlock, type LabelStyle } from './labelBlock.ts';
import { barBox, type PlacedLevel } from './levels.ts';
import type { PathwayPaint } from './pathwayPaint.ts';
import { placeLabels, type LabelRequest, type Leader } from './placeLabels.ts';
import type { AnnotationLabel } from './annotationShapes.ts';
import type { Box, OmittedLabel, PathItem, SceneItem } from './scene.ts';
import { stackBlock, type StackEntry } from './stackBlock.ts';
import { textItem } from './text/textItem.ts';
import { energyDecimals } from '../format/energyDecimals.ts';

/** Levels that get one label: a level with its twins (the same state in other pathways), or a stack of close levels at one slot. */
interface Group {
  entries: StackEntry[];
  /** Set for a stack: its laid-out block. */
  stack?: ReturnType<typeof stackBlock>;
}

/**
 * Labels for all levels. Levels at the same spot with the same name and printed energy
 * (a state shared by several pathways) get one label in ink. Levels at one slot too
 * close for a label between them get one stacked label: a line per level, top to bottom
 * as the bars lie, each with the pathway's key. Placed in slot order, then pathway order,
 * clear of every drawn primitive (`hard`: connectors, axis, annotations, anything drawn
 * before the labels) and each other, next to their own level — nothing nearer, nothing
 * between — or else joined to it by a leader line. Annotation labels (`extra`) are placed
 * after them beside their arrows. `measured` holds blocks already built for some points
 * (with this same style). A label with no clear spot inside `bounds` is left out (see
 * placeLabels) and listed in `omitted`, in placement order. Returns the items and the drawn
 * label boxes (for tests and hit-testing).
 */
export function labels(ctx: FigureContext, placed: readonly PlacedLevel[], paints: ReadonlyMap<number, PathwayPaint>, bounds: Box, hard: readonly Box[], extra: { labels: readonly AnnotationLabel[] } = { labels: [] }, measured: ReadonlyMap<LayoutPoint, LabelBlock> = new Map()): { items: SceneItem[]; boxes: Box[]; annotationBoxes: Box[]; omitted: OmittedLabel[] } {
  const style: LabelStyle = {
    metrics: ctx.metrics, sizeMm: ctx.sizeMm, decimals: energyDecimals(ctx.doc.settings, ctx.unit),
    energyFormat: ctx.doc.figure.energyFormat, unit: ctx.unit, daggerOnTs: ctx.doc.figure.daggerOnTs, autoSubscript: ctx.autoSubscript,
  };
  // A level is its bar and its error bar: a label keeps clear of both and sits next to either.
  const bars = new Map(placed.map((l) => [l, barBox(l, ctx, paints.get(l.point.pathwayIndex)?.weight)] as const));
  const levelBoxes = [...bars.values(), ...placed.flatMap((l) => l.errorBar ?? [])];
  const place = (gs: readonly Group[]) => {
    const rs = gs.map((g) => request(g, bars, ctx.lineMm));
    return { requests: rs, all: placeLabels([...rs, ...extra.labels.map((l) => l.request)], { hard: [...levelBoxes, ...hard], soft: [], bars: levelBoxes }, bounds, ctx.gapMm) };
  };
  let groups = stacks(ctx, twins(ctx, placed, style, measured), style, paints);
  let { requests, all } = place(groups);
  // A stack with no spot as one block is tried once more as two (its upper and its lower
  // levels), so a crowded slot loses as few labels as it must, not all of them at once.
  if (groups.some((g, i) => g.stack && all[i] === null)) {
    groups = groups.flatMap((g, i) => (g.stack && all[i] === null ? halves(ctx, g, style, paints) : [g]));
    ({ requests, all } = place(groups));
  }
  const placements = all.slice(0, requests.length);
  const items: SceneItem[] = [];
  const omitted: OmittedLabel[] = [];
  const names = new Map(ctx.doc.pathways.map((p) => [p.id, p.name]));
  const boxes = placements.filter((p) => p !== null).map((p) => p.box);
  groups.forEach((g, i) => {
    const placement = placements[i];
    if (!placement) {
      for (const e of g.entries) {
        const { pathwayId: pathway, pointId: point, label } = e.levels[0]!.point;
        omitted.push({ kind: 'level', pathway, point, pathwayName: names.get(pathway) ?? pathway, label });
      }
      return;
    }
    const first = g.entries[0]!.levels[0]!.point;
    const ids = { pathway: first.pathwayId, point: first.pointId };
    if (placement.leader) items.push(leaderLine(ctx, placement.leader, ids));
    if (g.stack) {
      items.push(...g.stack.draw(placement.box));
      return;
    }
    const { levels, block } = g.entries[0]!;
    const shared = levels.length > 1;
    const colour = shared ? ctx.theme.ink : paints.get(first.pathwayIndex)!.colour;
    const owners = shared ? { levels: levels.map((l) => ({ pathway: l.point.pathwayId, point: l.point.pointId })) } : {};
    items.push(...blockItems(block, placement.box, ctx.theme.ink, colour, { ...ids, ...owners }));
  });
  const annotationBoxes: Box[] = [];
  all.slice(requests.length).forEach((p, k) => {
    const { request: r, lines, annotation, pathway } = extra.labels[k]!;
    if (!p) {
      const text = lines.map((l) => l.runs.map((run) => run.text).join('')).join(' ');
      omitted.push({ kind: 'annotation', annotation, pathway, pathwayName: names.get(pathway) ?? pathway, text });
      return;
    }
    if (p.displaced) {
      const x1 = Math.min(Math.max(r.x, p.box.x), p.box.x + p.box.w);
      const y1 = Math.min(Math.max(r.y, p.box.y), p.box.y + p.box.h);
      items.push(leaderLine(ctx, { x0: r.x, y0: r.y, x1, y1 }, {}));
    }
    let top = p.box.y;
    for (const l of lines) {
      items.push(textItem(l, p.box.x, top + l.ascent, ctx.theme.ink, 'annotation'));
      top += l.ascent + l.descent;
    }
    annotationBoxes.push(p.box);
  });
  return { items, boxes, annotationBoxes, omitted };
}

/**
 * Levels in slot order, then pathway order, with levels at one spot printing the same
 * energy joined into one entry: the same state in several pathways, named once, or under
 * each of its names (one line each) when the pathways call it differently.
 */
function twins(ctx: FigureContext, placed: readonly PlacedLevel[], style: LabelStyle, measured: ReadonlyMap<LayoutPoint, LabelBlock>): StackEntry[] {
  const order = [...placed].sort((a, b) => a.x - b.x || a.point.pathwayIndex - b.point.pathwayIndex || a.y - b.y);
  const entries: (StackEntry & { names: string[] })[] = [];
  const byKey = new Map<string, (StackEntry & { names: string[] })[]>();
  for (const level of order) {
    const block = measured.get(level.point) ?? labelBlock(level.point.label, level.point.kind, level.point.energy!, style);
    const key = `${level.x.toFixed(4)}|${block.energyText}`;
    const twin = byKey.get(key)?.find((e) => Math.abs(e.levels[0]!.y - level.y) < 0.5 * ctx.strokeMm);
    if (!twin) {
      const entry = { levels: [level], block, names: [level.point.label] };
      entries.push(entry);
      byKey.set(key, [...(byKey.get(key) ?? []), entry]);
      continue;
    }
    twin.levels.push(level);
    if (twin.names.includes(level.point.label)) continue;
    twin.names.push(level.point.label);
    const first = twin.levels[0]!.point;
    const kind = twin.levels.every((l) => l.point.kind === 'ts') ? 'ts' : 'min';
    twin.block = namesBlock(twin.names.filter((n) => n.trim() !== ''), kind, first.energy!, style);
  }
  return entries;
}

/**
 * Joins entries at one slot whose bars lie too close for a label between them (and that
 * the user has not placed by hand) into stacks; the rest stay single.
 */
function stacks(ctx: FigureContext, entries: readonly StackEntry[], style: LabelStyle, paints: ReadonlyMap<number, PathwayPaint>): Group[] {
  const bySlot = new Map<string, StackEntry[]>();
  for (const e of entries) {
    const k = e.levels[0]!.x.toFixed(4);
    bySlot.set(k, [...(bySlot.get(k) ?? []), e]);
  }
  const groups: Group[] = [];
  for (const slot of bySlot.values()) {
    const free = slot.filter((e) => !e.levels[0]!.point.labelOffsetMm).sort((a, b) => a.levels[0]!.y - b.levels[0]!.y);
    for (const e of slot) if (e.levels[0]!.point.labelOffsetMm) groups.push({ entries: [e] });
    let run: StackEntry[] = [];
    const flush = () => {
      if (run.length === 1) groups.push({ entries: run });
      else if (run.length > 1) {
        const first = run[0]!.levels[0]!.point;
        groups.push({ entries: run, stack: stackBlock(ctx, run, style, paints, `stack/${first.pathwayId}/${first.pointId}`) });
      }
      run = [];
    };
    for (const e of free) {
      const prev = run[run.length - 1];
      // Room for a label between two bars: its height and clear space on both sides.
      if (prev && e.levels[0]!.y - prev.levels[0]!.y >= Math.max(prev.block.h, e.block.h) + 6 * ctx.gapMm) flush();
      run.push(e);
    }
    flush();
  }
  return groups;
}

/** A stack split into its upper and lower levels, each a stack again or a single label. */
function halves(ctx: FigureContext, g: Group, style: LabelStyle, paints: ReadonlyMap<number, PathwayPaint>): Group[] {
  const mid = Math.ceil(g.entries.length / 2);
  return [g.entries.slice(0, mid), g.entries.slice(mid)].map((run): Group => {
    if (run.length === 1) return { entries: run };
    const first = run[0]!.levels[0]!.point;
    return { entries: run, stack: stackBlock(ctx, run, style, paints, `stack/${first.pathwayId}/${first.pointId}`) };
  });
}

/**
 * How far a label block may sit from its own nearest level without a leader, in text line
 * heights (our choice, the same as the geometry audit's): up to one blank line of space
 * between a block and its bar still reads as its label; more, and a reader can no longer
 * tell which level it names.
 */
const NEAR_LEVEL_LINES = 1;

function request(g: Group, bars: ReadonlyMap<PlacedLevel, Box>, lineMm: number): LabelRequest {
  const levels = g.entries.flatMap((e) => e.levels);
  const top = levels[0]!;
  const own = levels.map((l) => bars.get(l)!);
  const attached = levels.flatMap((l) => l.errorBar ?? []);
  const farMm = NEAR_LEVEL_LINES * lineMm;
  if (!g.stack) {
    const block = g.entries[0]!.block;
    return {
      x: top.x, y: top.y, halfWidth: top.halfWidth, w: block.w, h: block.h, own, attached, farMm,
      prefer: top.point.kind === 'ts' ? 'above' : 'below',
      ...(top.point.labelOffsetMm ? { fixed: top.point.labelOffsetMm } : {}),
    };
  }
  const ys = levels.map((l) => l.y);
  const ts = levels.filter((l) => l.point.kind === 'ts').length;
  return {
    x: top.x, y: top.y, halfWidth: Math.max(...levels.map((l) => l.halfWidth)), w: g.stack.w, h: g.stack.h, own, attached, farMm,
    nearMm: Math.max(...g.entries.map((e) => e.block.h)),
    yTop: Math.min(...ys), yBottom: Math.max(...ys), prefer: 2 * ts >= levels.length ? 'above' : 'below',
  };
}

function leaderLine(ctx: FigureContext, l: Leader, ids: { pathway?: string; point?: string }): PathItem {
  return {
    kind: 'path', role: 'leader', ...ids,
    stroke: { colour: ctx.theme.muted, widthMm: 0.5 * ctx.strokeMm, cap: 'butt' },
    segments: [{ op: 'M', x: l.x0, y: l.y0 }, { op: 'L', x: l.x1, y: l.y1 }],
  };
}
