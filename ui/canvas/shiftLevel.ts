import type { PathItem, Scene, SceneItem, Segment } from '../../core/figure/scene.ts';

const EPS = 1e-6;

/** A level being moved on screen before the document catches up. */
export interface LevelShift {
  pathway: string;
  point: string;
  /** Vertical travel on the page, mm (down is positive). */
  dyMm: number;
}

function touches(item: PathItem, y: number, xs: readonly number[]): { start: boolean; end: boolean } {
  const on = (s: Segment | undefined) => s !== undefined && s.op !== 'Z' && Math.abs(s.y - y) < EPS && xs.some((x) => Math.abs(s.x - x) < EPS);
  return { start: on(item.segments[0]), end: on(item.segments.at(-1)) };
}

function moveEnds(item: PathItem, y: number, xs: readonly number[], dy: number): PathItem {
  const { start, end } = touches(item, y, xs);
  if (!start && !end) return item;
  const out = item.segments.map((s) => ({ ...s })) as Segment[];
  const firstCurve = out.findIndex((s) => s.op === 'C');
  let lastCurve = -1;
  out.forEach((s, i) => { if (s.op === 'C') lastCurve = i; });
  if (start) {
    (out[0] as { y: number }).y += dy;
    const c = out[firstCurve];
    if (c?.op === 'C' && Math.abs(c.y1 - y) < EPS) c.y1 += dy;
  }
  if (end) {
    (out[out.length - 1] as { y: number }).y += dy;
    const c = out[lastCurve];
    if (c?.op === 'C' && Math.abs(c.y2 - y) < EPS) c.y2 += dy;
  }
  return { ...item, segments: out };
}

function translate(item: SceneItem, dy: number): SceneItem {
  if (item.kind === 'text') return { ...item, y: item.y + dy, box: { ...item.box, y: item.box.y + dy } };
  return { ...item, segments: item.segments.map((s) => (s.op === 'Z' ? s : s.op === 'C' ? { ...s, y1: s.y1 + dy, y2: s.y2 + dy, y: s.y + dy } : { ...s, y: s.y + dy })) };
}

function barOf(scene: Scene, pathway: string, point: string) {
  const bar = scene.items.find((i): i is PathItem => i.kind === 'path' && i.role === 'level' && i.pathway === pathway && i.point === point);
  const [a, b] = bar?.segments ?? [];
  return bar && a?.op === 'M' && b?.op === 'L' ? { y: a.y, xs: [a.x, b.x, (a.x + b.x) / 2] } : null;
}

/**
 * What moves when one level is dragged: the level, its label and leader, and the
 * connectors that meet it, as a scene of their own (drawn on a layer above) and as the
 * set of items the figure underneath hides meanwhile. The figure underneath keeps its
 * scene unchanged, so starting a drag does not redraw it.
 */
export function splitScene(scene: Scene, pathway: string, point: string): { moving: Scene; hidden: ReadonlySet<SceneItem> } {
  const bar = barOf(scene, pathway, point);
  if (!bar) return { moving: { ...scene, background: null, items: [] }, hidden: new Set() };
  const moves = (item: SceneItem) => item.pathway === pathway && (item.point === point
    || (item.kind === 'path' && item.role === 'connector' && Object.values(touches(item, bar.y, bar.xs)).some(Boolean)));
  const items = scene.items.filter(moves);
  return { moving: { ...scene, background: null, items }, hidden: new Set(items) };
}

/**
 * The scene with one level, its label and the ends of the connectors that meet it moved
 * by `dyMm`; every other item keeps its identity, so redrawing costs only what moved.
 * Used while a drag outruns a full layout of a large document.
 */
export function shiftLevel(scene: Scene, shift: LevelShift): Scene {
  const bar = barOf(scene, shift.pathway, shift.point);
  if (!bar || shift.dyMm === 0) return scene;
  const items = scene.items.map((item) => {
    if (item.pathway !== shift.pathway) return item;
    if (item.point === shift.point) return translate(item, shift.dyMm);
    return item.kind === 'path' && item.role === 'connector' ? moveEnds(item, bar.y, bar.xs, shift.dyMm) : item;
  });
  return { ...scene, items };
}
