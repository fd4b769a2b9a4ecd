import type { ResolvedProfile } from '../profile/types.ts';
import type { PathItem, Scene, SceneItem } from './scene.ts';

/** Lower and upper end of a level's error bar, in J/mol on the profile's scale. */
export interface EnergyRange { low: number; high: number }

/** Error bars by level, keyed by `errorBarKey(pathway, point)`. */
export type ErrorBarRanges = ReadonlyMap<string, EnergyRange>;

/** The key of a level in `ErrorBarRanges`. */
export const errorBarKey = (pathway: string, point: string) => `${pathway}\u0000${point}`;

/**
 * The scene with a vertical error bar (whisker with caps) drawn over each level that has a
 * range, in the level's colour, under its bar. The energy → y map is read back from the
 * levels themselves (the layout's scale is linear), so this add-on needs nothing from the
 * layout; the layout does not make room for the bars or keep labels clear of them.
 */
export function addErrorBars(scene: Scene, profile: ResolvedProfile, ranges: ErrorBarRanges): Scene {
  if (ranges.size === 0) return scene;
  const energy = new Map<string, number>();
  for (const p of profile.pathways) for (const q of p.points) if (q.energyJ !== null) energy.set(errorBarKey(p.id, q.id), q.energyJ);
  const bars = scene.items.filter((i): i is PathItem & { pathway: string; point: string } => i.kind === 'path' && i.role === 'level' && i.pathway !== undefined && i.point !== undefined);
  const known = bars.map((b) => ({ bar: b, e: energy.get(errorBarKey(b.pathway, b.point)), y: (b.segments[0] as { y: number }).y })).filter((k): k is typeof k & { e: number } => k.e !== undefined);
  const lo = known.reduce<(typeof known)[number] | null>((a, k) => (a === null || k.e < a.e ? k : a), null);
  const hi = known.reduce<(typeof known)[number] | null>((a, k) => (a === null || k.e > a.e ? k : a), null);
  if (!lo || !hi || hi.e === lo.e) return scene;
  const slope = (hi.y - lo.y) / (hi.e - lo.e);
  const y = (e: number) => lo.y + (e - lo.e) * slope;
  const whiskers: SceneItem[] = [];
  for (const { bar } of known) {
    const range = ranges.get(errorBarKey(bar.pathway, bar.point));
    if (!range) continue;
    const [a, b] = bar.segments as { x: number }[];
    const x = (a!.x + b!.x) / 2;
    const cap = Math.min(Math.abs(b!.x - a!.x) / 4, 1.2);
    const [top, bottom] = [y(range.high), y(range.low)];
    const stroke = { colour: bar.stroke!.colour, widthMm: bar.stroke!.widthMm / 3, cap: 'butt' as const };
    whiskers.push({
      kind: 'path', role: 'errorBar', pathway: bar.pathway, point: bar.point, stroke,
      segments: [
        { op: 'M', x, y: top }, { op: 'L', x, y: bottom },
        { op: 'M', x: x - cap, y: top }, { op: 'L', x: x + cap, y: top },
        { op: 'M', x: x - cap, y: bottom }, { op: 'L', x: x + cap, y: bottom },
      ],
    });
  }
  const first = scene.items.findIndex((i) => i.kind === 'path' && i.role === 'level');
  const items = [...scene.items.slice(0, first), ...whiskers, ...scene.items.slice(first)];
  return { ...scene, items };
}
