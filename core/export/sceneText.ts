import type { Scene } from '../figure/scene.ts';
import { safeText } from '../format/safeText.ts';

/** Every distinct character the scene prints, sorted (the glyph set a subset font needs). */
export function sceneText(scene: Scene): string {
  const chars = new Set<string>();
  for (const item of scene.items) {
    if (item.kind !== 'text') continue;
    for (const run of item.runs) for (const ch of safeText(run.text)) chars.add(ch);
  }
  return [...chars].sort().join('');
}
