import type { Scene, SceneItem } from './scene.ts';
import type { DrawingSink } from './sink.ts';

/** Walks a scene in order and replays it onto a sink (background first, if any), opening and closing named groups. */
export function drawScene(scene: Scene, sink: DrawingSink): void {
  if (scene.background) {
    sink.moveTo(0, 0);
    sink.lineTo(scene.widthMm, 0);
    sink.lineTo(scene.widthMm, scene.heightMm);
    sink.lineTo(0, scene.heightMm);
    sink.closePath();
    sink.paint(undefined, scene.background);
  }
  drawItems(scene.items, sink);
}

/**
 * Replays items in order, opening a sink group around each run of items that share a
 * `group` (a molecule drawing), so an SVG keeps one `<g>` per drawing.
 */
export function drawItems(items: readonly SceneItem[], sink: DrawingSink): void {
  let group: string | undefined;
  for (const item of items) {
    if (item.group !== group) {
      if (group !== undefined) sink.group?.(null, {});
      group = item.group;
      if (group !== undefined) sink.group?.(group, { pathway: item.pathway, point: item.point });
    }
    drawItem(item, sink);
  }
  if (group !== undefined) sink.group?.(null, {});
}

/** Replays one scene item onto a sink (items of kinds a sink cannot draw are skipped). */
export function drawItem(item: SceneItem, sink: DrawingSink): void {
  if (item.kind === 'text') {
    sink.text(item);
    return;
  }
  if (item.kind !== 'path') return;
  for (const s of item.segments) {
    if (s.op === 'M') sink.moveTo(s.x, s.y);
    else if (s.op === 'L') sink.lineTo(s.x, s.y);
    else if (s.op === 'C') sink.curveTo(s.x1, s.y1, s.x2, s.y2, s.x, s.y);
    else sink.closePath();
  }
  sink.paint(item.stroke, item.fill);
}
