import type { Box, PathItem, Scene, SceneItem, TextItem } from '../scene.ts';

/** One straight piece of a stroked path, grown by half its stroke width when tested. */
export interface StrokePiece {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  half: number;
  item: number;
  role: string;
  pathway?: string;
  point?: string;
}

/** A drawn text line: its box and the label block it belongs to (null when not a level label). */
export interface TextBox {
  box: Box;
  item: number;
  role: string;
  /** Key of its label block; the lines of one block share it. */
  block: string | null;
  /** Levels the block stands for, as "pathway/point". */
  owners: string[];
}

/** A part of a level as drawn: its bar, or a straight piece of its error bar; `box` includes the stroke. */
export interface Bar {
  box: Box;
  key: string;
  part: 'level' | 'errorBar';
}

/** Everything the audit measures, flattened from a scene. */
export interface ScenePrimitives {
  strokes: StrokePiece[];
  /** Filled shapes without a stroke, and scene items of kinds the audit does not know, by their box. */
  areas: { box: Box; item: number; role: string }[];
  texts: TextBox[];
  /** Level bars and the pieces of their error bars: an error bar is part of its level. */
  bars: Bar[];
}

/** Pieces per cubic Bézier when flattening (our choice: well under 0.05 mm off at figure sizes). */
const CURVE_PIECES = 16;

const levelKey = (pathway: string | undefined, point: string | undefined) => `${pathway ?? ''}/${point ?? ''}`;

/**
 * Flattens a scene into stroke pieces, filled areas, text boxes and level bars. Every item
 * counts except the page background: paths by their stroke (curves flattened) or their
 * filled extent, text by its box, and any other kind of item (a later primitive, such as a
 * structure drawing) by its `box` when it has one, so new drawings are obstacles without
 * the audit knowing them.
 */
export function scenePrimitives(scene: Scene): ScenePrimitives {
  const out: ScenePrimitives = { strokes: [], areas: [], texts: [], bars: [] };
  scene.items.forEach((item: SceneItem, i) => {
    if (item.kind === 'path') addPath(out, item, i);
    else if (item.kind === 'text') addText(out, item, i);
    else {
      const box = (item as { box?: Box }).box;
      if (box) out.areas.push({ box, item: i, role: String((item as { role?: string }).role ?? 'other') });
    }
  });
  return out;
}

function addPath(out: ScenePrimitives, item: PathItem, i: number): void {
  if (item.role === 'background') return;
  if (item.role === 'label') {
    // A mark inside a label (a pathway key) is read as part of the label, like its text.
    const half = (item.stroke?.widthMm ?? 0) / 2;
    // Butt caps end at the path's ends; only round caps reach past them.
    const cap = item.stroke?.cap === 'round' ? half : 0;
    const e = extent(item);
    const owners = (item.levels ?? [{ pathway: item.pathway ?? '', point: item.point ?? '' }]).map((l) => levelKey(l.pathway, l.point));
    out.texts.push({ box: { x: e.x - cap, y: e.y - half, w: e.w + 2 * cap, h: e.h + 2 * half }, item: i, role: item.role, block: item.block ?? owners.join('|'), owners });
    return;
  }
  if (!item.stroke) {
    if (item.fill) out.areas.push({ box: extent(item), item: i, role: item.role });
    return;
  }
  const half = item.stroke.widthMm / 2;
  const ids = { item: i, role: item.role, ...(item.pathway ? { pathway: item.pathway } : {}), ...(item.point ? { point: item.point } : {}) };
  let [x, y, sx, sy] = [0, 0, 0, 0];
  const piece = (x1: number, y1: number) => {
    out.strokes.push({ x0: x, y0: y, x1, y1, half, ...ids });
    [x, y] = [x1, y1];
  };
  for (const s of item.segments) {
    if (s.op === 'M') [x, y, sx, sy] = [s.x, s.y, s.x, s.y];
    else if (s.op === 'L') piece(s.x, s.y);
    else if (s.op === 'Z') piece(sx, sy);
    else {
      const [x0, y0] = [x, y];
      for (let k = 1; k <= CURVE_PIECES; k++) {
        const t = k / CURVE_PIECES;
        const u = 1 - t;
        piece(u * u * u * x0 + 3 * u * u * t * s.x1 + 3 * u * t * t * s.x2 + t * t * t * s.x,
          u * u * u * y0 + 3 * u * u * t * s.y1 + 3 * u * t * t * s.y2 + t * t * t * s.y);
      }
    }
  }
  if (item.role === 'level' && item.segments.length === 2) {
    const [a, b] = item.segments as unknown as [{ x: number; y: number }, { x: number; y: number }];
    const x0 = Math.min(a.x, b.x);
    out.bars.push({ box: { x: x0, y: a.y - half, w: Math.max(a.x, b.x) - x0, h: 2 * half }, key: levelKey(item.pathway, item.point), part: 'level' });
  }
  if (item.role === 'errorBar') {
    const key = levelKey(item.pathway, item.point);
    for (const s of out.strokes) {
      if (s.item !== i) continue;
      const x = Math.min(s.x0, s.x1);
      const y = Math.min(s.y0, s.y1);
      out.bars.push({ box: { x: x - half, y: y - half, w: Math.abs(s.x1 - s.x0) + 2 * half, h: Math.abs(s.y1 - s.y0) + 2 * half }, key, part: 'errorBar' });
    }
  }
}

function addText(out: ScenePrimitives, item: TextItem, i: number): void {
  const label = item.role === 'label';
  const owners = label ? (item.levels ?? [{ pathway: item.pathway ?? '', point: item.point ?? '' }]).map((l) => levelKey(l.pathway, l.point)) : [];
  out.texts.push({ box: item.box, item: i, role: item.role, block: label ? (item.block ?? owners.join('|')) : null, owners });
}

function extent(item: PathItem): Box {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of item.segments) {
    if (s.op === 'Z') continue;
    xs.push(s.x);
    ys.push(s.y);
    if (s.op === 'C') xs.push(s.x1, s.x2), ys.push(s.y1, s.y2);
  }
  const x = Math.min(...xs);
  const y = Math.min(...ys);
  return { x, y, w: Math.max(...xs) - x, h: Math.max(...ys) - y };
}
