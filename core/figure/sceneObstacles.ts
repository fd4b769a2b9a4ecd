import { pathPieces } from './pathPieces.ts';
import type { Box, SceneItem } from './scene.ts';

/**
 * What labels must keep clear of, read from the items drawn so far: every stroked path
 * as small boxes along it (stroke width included), filled shapes and text by their extent,
 * and any other kind of item by its `box`, so primitives added later count without
 * changes here. Level bars and their error bars are left out when `skipLevels` (the label
 * placement files them itself, as parts of their levels).
 */
export function sceneObstacles(items: readonly SceneItem[], skipLevels = true): Box[] {
  const boxes: Box[] = [];
  for (const item of items) {
    if (item.kind === 'text') boxes.push(item.box);
    else if (item.kind === 'path') {
      if (item.role === 'background' || (skipLevels && (item.role === 'level' || item.role === 'errorBar'))) continue;
      if (item.stroke) boxes.push(...pathPieces(item.segments, item.stroke.widthMm / 2));
      else if (item.fill) boxes.push(...pathPieces(item.segments, 0));
    } else {
      const box = (item as { box?: Box }).box;
      if (box) boxes.push(box);
    }
  }
  return boxes;
}
