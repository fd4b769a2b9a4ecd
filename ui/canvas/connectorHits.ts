import type { PathItem, Scene, Segment } from '../../core/figure/scene.ts';
import type { LevelBox, SceneGeometry } from './sceneGeometry.ts';
import { mm, pathData } from './pathData.ts';

/** A drawn connector, with the two points it joins, for picking on the canvas. */
export interface ConnectorHit {
  pathway: string;
  from: string;
  to: string;
  /** SVG path data of the connector, page mm. */
  d: string;
}

const at = (x: number, y: number) => `${mm(x)},${mm(y)}`;

type Drawn = Exclude<Segment, { op: 'Z' }>;

function ends(item: PathItem): { start: Drawn; end: Drawn } | null {
  const start = item.segments[0], end = item.segments.at(-1);
  return start && end && start.op !== 'Z' && end.op !== 'Z' ? { start, end } : null;
}

/**
 * The connectors of a scene with the points at their ends. The scene does not say which
 * points a connector joins, so they are read off the drawing: a connector starts at a
 * bar's right end (or its centre when bars overlap) and ends at the next bar's left end
 * (or centre), in the same pathway.
 */
export function connectorHits(scene: Scene, geometry: SceneGeometry): ConnectorHit[] {
  const starts = new Map<string, LevelBox>(), finishes = new Map<string, LevelBox>();
  for (const l of geometry.levels) {
    const mid = (l.x1 + l.x2) / 2;
    starts.set(`${l.pathway}|${at(l.x2, l.y)}`, l);
    starts.set(`${l.pathway}|${at(mid, l.y)}`, l);
    finishes.set(`${l.pathway}|${at(l.x1, l.y)}`, l);
    finishes.set(`${l.pathway}|${at(mid, l.y)}`, l);
  }
  const hits: ConnectorHit[] = [];
  for (const item of scene.items) {
    if (item.kind !== 'path' || item.role !== 'connector' || !item.pathway) continue;
    const e = ends(item);
    if (!e) continue;
    const from = starts.get(`${item.pathway}|${at(e.start.x, e.start.y)}`);
    const to = finishes.get(`${item.pathway}|${at(e.end.x, e.end.y)}`);
    if (from && to && from !== to) hits.push({ pathway: item.pathway, from: from.point, to: to.point, d: pathData(item.segments) });
  }
  return hits;
}
