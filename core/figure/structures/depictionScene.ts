import type { Depiction } from '../../structure/structureToolkit.ts';
import type { FontMetrics } from '../font/fontMetrics.ts';
import type { Scene } from '../scene.ts';
import type { Theme } from '../themes.ts';
import { depictionItems } from './depictionItems.ts';

/**
 * One depiction alone as a small scene (the species sheet's thumbnail and preview): the
 * same items the figure draws, fitted into `sizeMm` with a margin, theme ink on no page.
 */
export function depictionScene(d: Depiction, metrics: FontMetrics, theme: Theme, sizeMm: number): Scene {
  const xs = d.atoms.map((a) => a.x), ys = d.atoms.map((a) => a.y);
  const span = Math.max(1, Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
  const bondMm = (0.8 * sizeMm) / (span + 1);
  const style = { bondMm, strokeMm: 0.06 * bondMm, labelMm: 0.55 * bondMm, colour: theme.ink, metrics, pathway: '', point: '', group: 'structure' };
  const probe = depictionItems(d, style, 0, 0).box;
  const pad = 0.05 * sizeMm;
  const drawn = depictionItems(d, style, pad - probe.x, pad - probe.y);
  return { widthMm: probe.w + 2 * pad, heightMm: probe.h + 2 * pad, background: null, fontFamily: metrics.family, items: drawn.items, omittedLabels: [] };
}
