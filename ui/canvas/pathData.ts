import type { Segment } from '../../core/figure/scene.ts';

/** A page coordinate in mm as the canvas writes it: to the micrometre, shortest form. */
export const mm = (v: number) => String(Math.round(v * 1000) / 1000);

/** SVG path data for scene segments (the canvas's pick lines along connectors). */
export function pathData(segments: readonly Segment[]): string {
  return segments.map((s) => (s.op === 'Z' ? 'Z' : s.op === 'C' ? `C${mm(s.x1)} ${mm(s.y1)} ${mm(s.x2)} ${mm(s.y2)} ${mm(s.x)} ${mm(s.y)}` : `${s.op}${mm(s.x)} ${mm(s.y)}`)).join('');
}
