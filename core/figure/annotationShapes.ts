import type { AnnotationPlan } from './annotationPlans.ts';
import { annotationLines } from './annotationText.ts';
import { doubleArrow } from './doubleArrow.ts';
import { BAR_WEIGHT, type FigureContext } from './figureContext.ts';
import type { PlacedLevel } from './levels.ts';
import { pathPieces } from './pathPieces.ts';
import type { LabelRequest } from './placeLabels.ts';
import type { Box, PathItem, SceneItem, Segment } from './scene.ts';
import { autoSubscript } from './text/autoSubscript.ts';
import { layoutRichText, type RichLine } from './text/layoutRichText.ts';
import { parseMarkup } from './text/parseMarkup.ts';
import { textItem } from './text/textItem.ts';

/** The label an arrow or bracket wants placed beside it, with the annotation (index in `doc.figure.annotations`) and pathway it belongs to. */
export interface AnnotationLabel {
  request: LabelRequest;
  lines: RichLine[];
  annotation: number;
  pathway: string;
}

/** Drawn annotations: marks, what point labels must avoid, and labels still to place. */
export interface AnnotationShapes {
  items: SceneItem[];
  /** Arrow shafts, brackets and free text: labels never cross them. */
  hard: Box[];
  /** Dotted guide lines: labels avoid them where they can. */
  soft: Box[];
  labels: AnnotationLabel[];
}

/** Where the layout put things: a drawn level by pathway and point id, a slot's x, an energy's y. */
export interface AnnotationFrame {
  level(pathwayId: string, pointId: string): PlacedLevel | undefined;
  slotX(slot: number): number;
  y(energy: number): number;
}

/**
 * Geometry of the planned annotations. A barrier is a vertical double arrow at the centre
 * of the `to` level, from the height of `from` (joined to its bar by a dotted guide) to
 * the `to` bar. An energetic span is a bracket with end ticks: below the TDTS bar down to
 * the TDI's height (guide from the TDI), or — when the TDTS comes before the TDI — above the
 * TDI bar up to T_TDTS + ΔG_r, the TDTS of the next turnover, marked by a short dashed bar.
 * Free text is centred on its (slot, energy) point.
 */
export function annotationShapes(ctx: FigureContext, plans: readonly AnnotationPlan[], frame: AnnotationFrame): AnnotationShapes {
  const out: AnnotationShapes = { items: [], hard: [], soft: [], labels: [] };
  const ink = ctx.theme.ink;
  const line = { colour: ink, widthMm: 0.6 * ctx.strokeMm, cap: 'butt' as const };
  const guide = { colour: ctx.theme.muted, widthMm: 0.5 * ctx.strokeMm, cap: 'butt' as const, dashMm: [ctx.strokeMm, 1.5 * ctx.strokeMm] };
  const barHalf = (BAR_WEIGHT * ctx.strokeMm) / 2;
  const head = Math.max(0.9, 3 * ctx.strokeMm);
  const path = (segments: Segment[], paint: Pick<PathItem, 'stroke' | 'fill'>, pathway?: string): PathItem =>
    ({ kind: 'path', role: 'annotation', segments, ...paint, ...(pathway ? { pathway } : {}) });
  const addGuide = (level: PlacedLevel, x: number, pathway: string) => {
    if (Math.abs(level.x - x) <= level.halfWidth) return;
    const from = x > level.x ? level.x + level.halfWidth : level.x - level.halfWidth;
    const segments: Segment[] = [{ op: 'M', x: from, y: level.y }, { op: 'L', x, y: level.y }];
    out.items.push(path(segments, { stroke: guide }, pathway));
    out.soft.push(...pathPieces(segments, guide.widthMm / 2, 4));
  };
  const addLabel = (plan: Exclude<AnnotationPlan, { kind: 'text' }>, x: number, y0: number, y1: number, halfWidth: number) => {
    const lines = annotationLines(plan, ctx);
    const w = Math.max(...lines.map((l) => l.width));
    const h = lines.reduce((s, l) => s + l.ascent + l.descent, 0);
    const pathway = plan.kind === 'barrier' ? plan.from.pathwayId : plan.pathwayId;
    out.labels.push({ request: { x, y: (y0 + y1) / 2, halfWidth, w, h, prefer: 'beside' }, lines, annotation: plan.annotation, pathway });
  };
  for (const plan of plans) {
    if (plan.kind === 'text') {
      const spans = parseMarkup(plan.text);
      const text = layoutRichText(ctx.autoSubscript ? autoSubscript(spans) : spans, ctx.metrics, ctx.sizeMm);
      const [cx, cy] = [frame.slotX(plan.slot), frame.y(plan.energy)];
      const item = textItem(text, cx - text.width / 2, cy + (text.ascent - text.descent) / 2, ink, 'annotation');
      out.items.push(item);
      out.hard.push(item.box);
      continue;
    }
    if (plan.kind === 'barrier') {
      const from = frame.level(plan.from.pathwayId, plan.from.pointId);
      const to = frame.level(plan.to.pathwayId, plan.to.pointId);
      if (!from || !to) continue;
      const toward = Math.sign(from.y - to.y) || 1;
      const arrow = doubleArrow(to.x, from.y, to.y + toward * barHalf, head);
      addGuide(from, to.x, plan.from.pathwayId);
      out.items.push(path(arrow.shaft, { stroke: line }, plan.from.pathwayId), path(arrow.heads, { fill: ink }, plan.from.pathwayId));
      out.hard.push(...pathPieces(arrow.shaft, head * 0.4, 4));
      addLabel(plan, to.x, from.y, to.y, head * 0.4);
      continue;
    }
    const tdi = frame.level(plan.pathwayId, plan.tdi.pointId);
    const tdts = frame.level(plan.pathwayId, plan.tdts.pointId);
    if (!tdi || !tdts) continue;
    const anchor = plan.wrap ? tdi : tdts;
    const x = anchor.x;
    const [yLow, yHigh] = [frame.y(plan.low), frame.y(plan.high)];
    const tick = Math.min(anchor.halfWidth, 2 * head) * 0.6;
    // Start at the anchor bar's edge, end at the other height: no stroke under the bar.
    const y0 = plan.wrap ? yLow - barHalf : yHigh + barHalf;
    const y1 = plan.wrap ? yHigh : yLow;
    const bracket: Segment[] = [
      { op: 'M', x, y: y0 }, { op: 'L', x, y: y1 },
      { op: 'M', x: x - tick, y: y1 }, { op: 'L', x: x + tick, y: y1 },
    ];
    if (plan.wrap) {
      const ghost: Segment[] = [{ op: 'M', x: x - anchor.halfWidth, y: yHigh }, { op: 'L', x: x + anchor.halfWidth, y: yHigh }];
      out.items.push(path(ghost, { stroke: { ...guide, colour: ink, widthMm: BAR_WEIGHT * ctx.strokeMm * 0.6 } }, plan.pathwayId));
      out.hard.push(...pathPieces(ghost, barHalf, 1));
    } else {
      addGuide(tdi, x, plan.pathwayId);
    }
    out.items.push(path(bracket, { stroke: line }, plan.pathwayId));
    out.hard.push(...pathPieces(bracket.slice(0, 2), tick, 4));
    addLabel(plan, x, yLow, yHigh, tick);
  }
  return out;
}
