import type { Scene } from './scene.ts';
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
  let group: string | undefined;
  for (const item of scene.items) {
    if (item.group !== group) {
      if (group !== undefined) sink.group?.(null, {});
      group = item.group;
      if (group !== undefined) sink.group?.(group, { pathway: item.pathway, point: item.point });
    }
    if (item.kind === 'text') {
      sink.text(item);
      continue;
    }
    for (const s of item.segments) {
      if (s.op === 'M') sink.moveTo(s.x, s.y);
      else if (s.op === 'L') sink.lineTo(s.x, s.y);
      else if (s.op === 'C') sink.curveTo(s.x1, s.y1, s.x2, s.y2, s.x, s.y);
      else sink.closePath();
    }
    sink.paint(item.stroke, item.fill);
  }
  if (group !== undefined) sink.group?.(null, {});
}
