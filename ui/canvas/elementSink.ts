import { drawScene } from '../../core/figure/drawScene.ts';
import type { Role, Scene, SceneItem, Stroke, TextItem } from '../../core/figure/scene.ts';
import type { DrawingSink } from '../../core/figure/sink.ts';
import { mm as n } from './pathData.ts';

/** One SVG element for the canvas to render, in drawing order. */
export type SceneElement =
  | { type: 'path'; d: string; fill: string; stroke?: Stroke; role: Role | 'background'; pathway?: string; point?: string; item?: SceneItem }
  | { type: 'text'; item: TextItem };

const memo = new WeakMap<object, SceneElement>();


/**
 * The canvas's drawing sink: the same `drawScene` walk the SVG and PDF writers use,
 * collected as element descriptions that Svelte renders, so the screen draws exactly
 * what is exported. Each path keeps its scene item's role and point for picking.
 */
export function sceneElements(scene: Scene): SceneElement[] {
  const out: SceneElement[] = [];
  // Items that did not change (same object) keep their element, so Svelte skips them.
  const remembered = (item: Scene['items'][number] | undefined, make: () => SceneElement) => {
    if (!item) return make();
    let el = memo.get(item);
    if (!el) { el = make(); memo.set(item, el); }
    return el;
  };
  const items = scene.items;
  // drawScene paints the background first (when there is one), then items in order.
  let index = scene.background ? -1 : 0;
  let d = '';
  const sink: DrawingSink = {
    moveTo: (x, y) => { d += `M${n(x)} ${n(y)}`; },
    lineTo: (x, y) => { d += `L${n(x)} ${n(y)}`; },
    curveTo: (x1, y1, x2, y2, x, y) => { d += `C${n(x1)} ${n(y1)} ${n(x2)} ${n(y2)} ${n(x)} ${n(y)}`; },
    closePath: () => { d += 'Z'; },
    paint(stroke, fill) {
      const item = index >= 0 ? items[index] : undefined;
      const owner = item && item.kind === 'path' ? item : undefined;
      const path = d;
      out.push(remembered(item, () => ({
        type: 'path', d: path, fill: fill ?? 'none', role: owner?.role ?? 'background',
        ...(stroke ? { stroke } : {}), ...(owner ? { item: owner } : {}), ...(owner?.pathway ? { pathway: owner.pathway } : {}), ...(owner?.point ? { point: owner.point } : {}),
      })));
      d = '';
      index++;
    },
    text(item) {
      out.push(remembered(item, () => ({ type: 'text', item })));
      index++;
    },
  };
  drawScene(scene, sink);
  return out;
}
