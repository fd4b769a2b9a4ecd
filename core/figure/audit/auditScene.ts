import type { Box, Scene } from '../scene.ts';
import { scenePrimitives, type ScenePrimitives, type StrokePiece, type TextBox } from './scenePrimitives.ts';
import { segmentHitsBox } from './segmentHitsBox.ts';
import { boxDistance, growBox } from '../geometry.ts';

/** One fault the audit found: which rule, which scene items (indices into `scene.items`), in words. */
export interface AuditFault {
  items: number[];
  detail: string;
}

/**
 * What a reader could misread in a figure, read from its geometry alone:
 * - `crossings`: a stroke or filled shape through text (leaders of a label not counted against it);
 * - `overlaps`: two text items closer than the clearance (lines of one label block excepted);
 * - `misread`: a level label, without a leader line, whose nearest level is another one,
 *   farther than `FAR_LINES` of its text lines from its own level, or with another stroke or
 *   text between it and its own level (a level's error bar is part of that level: it counts
 *   in these distances and never lies between a label and its own level; crossing the
 *   label is still a `crossings` fault);
 * - `offPage`: text less than the page margin from the edge;
 * - `legendOverContent`: the legend's extent reaching any non-legend item.
 */
export interface FigureAudit {
  crossings: AuditFault[];
  overlaps: AuditFault[];
  misread: AuditFault[];
  offPage: AuditFault[];
  legendOverContent: AuditFault[];
}

/** Audit tolerances, mm. */
export interface AuditOptions {
  /** Text keeps at least this far inside the page (the issue's rule: 1 mm). */
  pageMarginMm?: number;
  /** Clear space text keeps from strokes (beyond half the stroke width) and from other text. */
  clearanceMm?: number;
}

const EPS = 1e-6;

/**
 * A label block farther than this many of its text line heights from its own level, with no
 * leader, counts as misread (our choice): up to one blank line of space between a block and
 * its bar still reads as that level's label; more, and a reader can no longer tell which
 * level it names, even when no other level is nearer (a stack pushed into a corner of the
 * plot). Tighter than 1.5 lines on purpose: a two-line stack left 5.4 mm (1.4 lines) below
 * its bars already read as loose.
 */
const FAR_LINES = 1;

/**
 * Audits any scene, however it was placed (the placement modules never call this): every
 * path, text and unknown primitive with a box counts, so drawings added to the scene later
 * are judged without changes here.
 */
export function auditScene(scene: Scene, options: AuditOptions = {}): FigureAudit {
  const margin = options.pageMarginMm ?? 1;
  const clear = options.clearanceMm ?? 0.1;
  const p = scenePrimitives(scene);
  const name = (i: number) => describe(scene, i);
  // A molecule drawing is one group: its own bonds end at its own atom labels by design, so
  // strokes and texts of one group are not judged against each other (the group as a whole is).
  const groupOf = (i: number) => scene.items[i]?.group;
  const sameGroup = (a: number, b: number) => groupOf(a) !== undefined && groupOf(a) === groupOf(b);
  const audit: FigureAudit = { crossings: [], overlaps: [], misread: [], offPage: [], legendOverContent: [] };

  for (const t of p.texts) {
    for (const s of p.strokes) {
      if (s.role === 'leader' && t.owners.includes(`${s.pathway ?? ''}/${s.point ?? ''}`)) continue;
      if (sameGroup(s.item, t.item)) continue;
      if (segmentHitsBox(s.x0, s.y0, s.x1, s.y1, growBox(t.box, s.half + clear))) {
        audit.crossings.push({ items: [s.item, t.item], detail: `${s.role} through ${name(t.item)}` });
      }
    }
    for (const a of p.areas) if (!sameGroup(a.item, t.item) && intersects(a.box, growBox(t.box, clear))) audit.crossings.push({ items: [a.item, t.item], detail: `${a.role} shape over ${name(t.item)}` });
    const b = t.box;
    if (b.x < margin - EPS || b.y < margin - EPS || b.x + b.w > scene.widthMm - margin + EPS || b.y + b.h > scene.heightMm - margin + EPS) {
      audit.offPage.push({ items: [t.item], detail: `${name(t.item)} within ${margin} mm of the page edge` });
    }
  }
  p.texts.forEach((a, i) => {
    for (const b of p.texts.slice(i + 1)) {
      if (a.block !== null && a.block === b.block) continue;
      if (sameGroup(a.item, b.item)) continue;
      if (intersects(growBox(a.box, clear / 2), growBox(b.box, clear / 2))) audit.overlaps.push({ items: [a.item, b.item], detail: `${name(a.item)} overlaps ${name(b.item)}` });
    }
  });
  audit.misread.push(...misreadLabels(p, name));
  audit.legendOverContent.push(...legendFaults(p, name));
  return audit;
}

/** Number of faults of each kind. */
export function auditCounts(audit: FigureAudit): Record<keyof FigureAudit, number> {
  return {
    crossings: audit.crossings.length, overlaps: audit.overlaps.length, misread: audit.misread.length,
    offPage: audit.offPage.length, legendOverContent: audit.legendOverContent.length,
  };
}

function misreadLabels(p: ScenePrimitives, name: (i: number) => string): AuditFault[] {
  const blocks = new Map<string, TextBox[]>();
  for (const t of p.texts) if (t.block !== null) blocks.set(t.block, [...(blocks.get(t.block) ?? []), t]);
  const led = new Set(p.strokes.filter((s) => s.role === 'leader').map((s) => `${s.pathway ?? ''}/${s.point ?? ''}`));
  const faults: AuditFault[] = [];
  for (const lines of blocks.values()) {
    const owners = lines[0]!.owners;
    if (owners.some((o) => led.has(o))) continue;
    const box = union(lines.map((l) => l.box));
    const items = lines.map((l) => l.item);
    const own = p.bars.filter((b) => owners.includes(b.key));
    if (own.length === 0) continue;
    const ownDistance = Math.min(...own.map((b) => boxDistance(box, b.box)));
    const nearer = p.bars.find((b) => !owners.includes(b.key) && boxDistance(box, b.box) < ownDistance - 1e-3);
    if (nearer) {
      faults.push({ items, detail: `${name(items[0]!)}: nearest level is ${nearer.key}, not its own` });
      continue;
    }
    const lineMm = Math.max(...lines.map((l) => l.box.h));
    if (ownDistance > FAR_LINES * lineMm + EPS) {
      faults.push({ items, detail: `${name(items[0]!)}: ${ownDistance.toFixed(1)} mm from its level with no leader` });
      continue;
    }
    const bar = own.find((b) => boxDistance(box, b.box) <= ownDistance + EPS)!;
    const gap = between(box, bar.box);
    if (!gap) continue;
    const ownBars = new Set(own.map((b) => b.key));
    const ownPart = (s: StrokePiece) => (s.role === 'level' || s.role === 'errorBar') && ownBars.has(`${s.pathway ?? ''}/${s.point ?? ''}`);
    const stroke = p.strokes.find((s) => !ownPart(s) && segmentHitsBox(s.x0, s.y0, s.x1, s.y1, gap));
    const text = p.texts.find((t) => t.block !== lines[0]!.block && intersects(t.box, gap));
    if (stroke || text) faults.push({ items, detail: `${name(items[0]!)}: ${stroke ? `a ${stroke.role}` : name(text!.item)} lies between the label and its level` });
  }
  return faults;
}

function legendFaults(p: ScenePrimitives, name: (i: number) => string): AuditFault[] {
  const legendBoxes = [...p.texts.filter((t) => t.role === 'legend').map((t) => t.box), ...p.strokes.filter((s) => s.role === 'legend').map(pieceBox)];
  if (legendBoxes.length === 0) return [];
  const key = union(legendBoxes);
  const faults: AuditFault[] = [];
  for (const s of p.strokes) if (s.role !== 'legend' && segmentHitsBox(s.x0, s.y0, s.x1, s.y1, growBox(key, s.half))) faults.push({ items: [s.item], detail: `${s.role} inside the legend` });
  for (const t of p.texts) if (t.role !== 'legend' && intersects(t.box, key)) faults.push({ items: [t.item], detail: `${name(t.item)} inside the legend` });
  for (const a of p.areas) if (intersects(a.box, key)) faults.push({ items: [a.item], detail: `${a.role} shape inside the legend` });
  return faults;
}

/** The open space between a label block and a bar, shrunk a little; null when they touch or sit diagonally. */
function between(a: Box, b: Box): Box | null {
  const s = 0.05;
  const x0 = Math.max(a.x, b.x);
  const x1 = Math.min(a.x + a.w, b.x + b.w);
  const y0 = Math.max(a.y, b.y);
  const y1 = Math.min(a.y + a.h, b.y + b.h);
  if (x1 - x0 > 2 * s) {
    const [top, bottom] = a.y + a.h <= b.y ? [a.y + a.h, b.y] : [b.y + b.h, a.y];
    return bottom - top > 2 * s ? { x: x0 + s, y: top + s, w: x1 - x0 - 2 * s, h: bottom - top - 2 * s } : null;
  }
  if (y1 - y0 > 0) {
    const [left, right] = a.x + a.w <= b.x ? [a.x + a.w, b.x] : [b.x + b.w, a.x];
    return right - left > 2 * s ? { x: left + s, y: y0, w: right - left - 2 * s, h: Math.max(y1 - y0, EPS) } : null;
  }
  return null;
}

function pieceBox(s: { x0: number; y0: number; x1: number; y1: number; half: number }): Box {
  return growBox({ x: Math.min(s.x0, s.x1), y: Math.min(s.y0, s.y1), w: Math.abs(s.x1 - s.x0), h: Math.abs(s.y1 - s.y0) }, s.half);
}



function intersects(a: Box, b: Box): boolean {
  return a.x < b.x + b.w - EPS && b.x < a.x + a.w - EPS && a.y < b.y + b.h - EPS && b.y < a.y + a.h - EPS;
}

function union(boxes: readonly Box[]): Box {
  const x = Math.min(...boxes.map((b) => b.x));
  const y = Math.min(...boxes.map((b) => b.y));
  return { x, y, w: Math.max(...boxes.map((b) => b.x + b.w)) - x, h: Math.max(...boxes.map((b) => b.y + b.h)) - y };
}

function describe(scene: Scene, i: number): string {
  const item = scene.items[i]!;
  if (item.kind === 'text') return `${item.role} "${item.runs.map((r) => r.text).join('')}"`;
  return `${item.role}${item.pathway ? ` of ${item.pathway}` : ''}${item.point ? `/${item.point}` : ''}`;
}
