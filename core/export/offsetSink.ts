import type { DrawingSink } from '../figure/sink.ts';

/** A sink that shifts everything by (dx, dy) mm before passing it on (a figure placed on a larger page). */
export function offsetSink(sink: DrawingSink, dx: number, dy: number): DrawingSink {
  return {
    moveTo: (x, y) => sink.moveTo(x + dx, y + dy),
    lineTo: (x, y) => sink.lineTo(x + dx, y + dy),
    curveTo: (x1, y1, x2, y2, x, y) => sink.curveTo(x1 + dx, y1 + dy, x2 + dx, y2 + dy, x + dx, y + dy),
    closePath: () => sink.closePath(),
    paint: (stroke, fill) => sink.paint(stroke, fill),
    text: (item) => sink.text({ ...item, x: item.x + dx, y: item.y + dy, box: { ...item.box, x: item.box.x + dx, y: item.box.y + dy } }),
  };
}
