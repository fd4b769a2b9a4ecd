import type { Scene } from '../../core/figure/scene.ts';
import { levelKey } from './sceneGeometry.ts';

/** The page box (mm) around each point's label text, for picking and dragging labels. */
export interface LabelBox { key: string; pathway: string; point: string; x: number; y: number; w: number; h: number }

/** Joins the boxes of all label text items of a point into one. */
export function labelBoxes(scene: Scene): LabelBox[] {
  const boxes = new Map<string, LabelBox>();
  for (const item of scene.items) {
    if (item.kind !== 'text' || item.role !== 'label' || !item.pathway || !item.point) continue;
    const key = levelKey(item.pathway, item.point);
    const b = item.box;
    const old = boxes.get(key);
    if (!old) { boxes.set(key, { key, pathway: item.pathway, point: item.point, ...b }); continue; }
    const x = Math.min(old.x, b.x), y = Math.min(old.y, b.y);
    boxes.set(key, { ...old, x, y, w: Math.max(old.x + old.w, b.x + b.w) - x, h: Math.max(old.y + old.h, b.y + b.h) - y });
  }
  return [...boxes.values()];
}
