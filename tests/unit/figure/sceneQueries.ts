import { BAR_WEIGHT } from '../../../core/figure/figureContext.ts';
import type { Box, PathItem, Scene, TextItem } from '../../../core/figure/scene.ts';

/** Text items of a role. */
export const texts = (scene: Scene, role: TextItem['role']) =>
  scene.items.filter((i): i is TextItem => i.kind === 'text' && i.role === role);

/** Path items of a role. */
export const paths = (scene: Scene, role: PathItem['role']) =>
  scene.items.filter((i): i is PathItem => i.kind === 'path' && i.role === role);

/** The plain text of a text item (runs joined). */
export const textOf = (item: TextItem) => item.runs.map((r) => r.text).join('');

/** Label blocks: the union box of the text lines of each labelled point. */
export function labelBoxes(scene: Scene): Box[] {
  const byPoint = new Map<string, Box>();
  for (const t of texts(scene, 'label')) {
    const key = `${t.pathway}/${t.point}`;
    const b = byPoint.get(key);
    if (!b) byPoint.set(key, { ...t.box });
    else {
      const x = Math.min(b.x, t.box.x);
      const y = Math.min(b.y, t.box.y);
      byPoint.set(key, { x, y, w: Math.max(b.x + b.w, t.box.x + t.box.w) - x, h: Math.max(b.y + b.h, t.box.y + t.box.h) - y });
    }
  }
  return [...byPoint.values()];
}

/** Boxes of the level bars, their stroke thickness included. */
export function barBoxes(scene: Scene): Box[] {
  return paths(scene, 'level').map((p) => {
    const [a, b] = p.segments as unknown as [{ x: number; y: number }, { x: number; y: number }];
    const half = p.stroke!.widthMm / 2;
    return { x: a.x, y: a.y - half, w: b.x - a.x, h: 2 * half };
  });
}

/** True when two boxes share interior area (computed here, not with the code under test). */
export function intersects(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

export { BAR_WEIGHT };
