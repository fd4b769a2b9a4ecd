import type { Depiction, DepictionAtom } from '../../structure/structureToolkit.ts';
import type { FontMetrics } from '../font/fontMetrics.ts';
import { measureText } from '../font/measureText.ts';
import type { Box, PathItem, Segment, TextItem, TextRun } from '../scene.ts';

/** How a depiction is drawn: sizes in mm, one ink colour, the ids its items carry. */
export interface DepictionStyle {
  bondMm: number;
  strokeMm: number;
  /** Em size of atom labels. */
  labelMm: number;
  colour: string;
  metrics: FontMetrics;
  pathway: string;
  point: string;
  /** Name of the scene group the items belong to. */
  group: string;
}

// Proportions of a skeletal drawing, in bond lengths (common practice for 2D depictions, our values).
const DOUBLE_GAP = 0.18;
const INNER_TRIM = 0.14;
const WEDGE_WIDTH = 0.22;
const HASHES = 6;

/**
 * The scene items of a depiction with its origin at (ox, oy): bonds as stroked paths
 * (double bonds with the second line inside the ring or on the substituents' side, wedges
 * filled, hashes as rungs, forming/breaking bonds dashed), heteroatoms, charged and lone
 * atoms as text labels with their hydrogens and charge. Returns the items and their box.
 */
export function depictionItems(d: Depiction, style: DepictionStyle, ox: number, oy: number): { items: (PathItem | TextItem)[]; box: Box } {
  const at = (a: DepictionAtom) => ({ x: ox + a.x * style.bondMm, y: oy + a.y * style.bondMm });
  const degree = d.atoms.map(() => 0);
  for (const b of d.bonds) { degree[b.from]!++; degree[b.to]!++; }
  const labels = d.atoms.map((a, i) => (a.element !== 'C' || a.charge !== 0 || degree[i] === 0 ? atomLabel(d, i, at(a), style) : null));
  const solid: Segment[] = [];
  const dashed: Segment[] = [];
  const filled: Segment[] = [];
  const line = (into: Segment[], x1: number, y1: number, x2: number, y2: number) => { into.push({ op: 'M', x: x1, y: y1 }, { op: 'L', x: x2, y: y2 }); };
  for (const b of d.bonds) {
    const p = at(d.atoms[b.from]!), q = at(d.atoms[b.to]!);
    const len = Math.hypot(q.x - p.x, q.y - p.y);
    if (len < 1e-9) continue;
    const ux = (q.x - p.x) / len, uy = (q.y - p.y) / len;
    const nx = -uy, ny = ux;
    const s = labels[b.from]?.clip ?? 0, e = len - (labels[b.to]?.clip ?? 0);
    if (e <= s) continue;
    const x1 = p.x + ux * s, y1 = p.y + uy * s, x2 = p.x + ux * e, y2 = p.y + uy * e;
    const g = DOUBLE_GAP * style.bondMm;
    if (b.partial) line(dashed, x1, y1, x2, y2);
    else if (b.stereo === 'wedge') {
      const w = (WEDGE_WIDTH * style.bondMm) / 2;
      filled.push({ op: 'M', x: x1, y: y1 }, { op: 'L', x: x2 + nx * w, y: y2 + ny * w }, { op: 'L', x: x2 - nx * w, y: y2 - ny * w }, { op: 'Z' });
    } else if (b.stereo === 'hash') {
      for (let k = 1; k <= HASHES; k++) {
        const t = k / HASHES, w = (WEDGE_WIDTH * style.bondMm * t) / 2;
        const cx = x1 + (x2 - x1) * t, cy = y1 + (y2 - y1) * t;
        line(solid, cx + nx * w, cy + ny * w, cx - nx * w, cy - ny * w);
      }
    } else if (b.order === 2) {
      const side = doubleSide(d, b.from, b.to);
      if (side === 0 || labels[b.from] || labels[b.to]) {
        line(solid, x1 + nx * g / 2, y1 + ny * g / 2, x2 + nx * g / 2, y2 + ny * g / 2);
        line(solid, x1 - nx * g / 2, y1 - ny * g / 2, x2 - nx * g / 2, y2 - ny * g / 2);
      } else {
        const trim = INNER_TRIM * style.bondMm;
        line(solid, x1, y1, x2, y2);
        line(solid, x1 + ux * trim + nx * g * side, y1 + uy * trim + ny * g * side, x2 - ux * trim + nx * g * side, y2 - uy * trim + ny * g * side);
      }
    } else if (b.order === 3) {
      line(solid, x1, y1, x2, y2);
      for (const k of [1, -1]) line(solid, x1 + nx * g * k, y1 + ny * g * k, x2 + nx * g * k, y2 + ny * g * k);
    } else line(solid, x1, y1, x2, y2);
  }
  const ids = { role: 'structure' as const, pathway: style.pathway, point: style.point, group: style.group };
  const stroke = { colour: style.colour, widthMm: style.strokeMm, cap: 'round' as const };
  const items: (PathItem | TextItem)[] = [];
  if (solid.length) items.push({ kind: 'path', ...ids, segments: solid, stroke });
  if (dashed.length) items.push({ kind: 'path', ...ids, segments: dashed, stroke: { ...stroke, cap: 'butt', dashMm: [0.12 * style.bondMm, 0.08 * style.bondMm] } });
  if (filled.length) items.push({ kind: 'path', ...ids, segments: filled, fill: style.colour });
  for (const l of labels) if (l) items.push({ ...l.item, ...ids });
  return { items, box: itemsBox(items, style.strokeMm / 2) };
}

/** +1 or −1: the side of bond from→to where the other neighbours lie (ring inside); 0 when balanced. */
function doubleSide(d: Depiction, from: number, to: number): number {
  const p = d.atoms[from]!, q = d.atoms[to]!;
  let sum = 0;
  for (const b of d.bonds) {
    for (const [end, other] of [[b.from, b.to], [b.to, b.from]] as const) {
      if ((end !== from && end !== to) || other === from || other === to) continue;
      const o = d.atoms[other]!;
      sum += Math.sign((q.x - p.x) * (o.y - p.y) - (q.y - p.y) * (o.x - p.x));
    }
  }
  return Math.sign(sum);
}

const SUB = 0.7;
const superscript = (q: number) => `${Math.abs(q) === 1 ? '' : Math.abs(q)}${q > 0 ? '+' : '−'}`;

/** A label with its element symbol centred on the atom; hydrogens and charge on the side away from the bonds. */
function atomLabel(d: Depiction, i: number, p: { x: number; y: number }, style: DepictionStyle): { item: TextItem; clip: number } {
  const a = d.atoms[i]!;
  const size = style.labelMm, small = SUB * size, m = style.metrics;
  let pull = 0;
  for (const b of d.bonds) {
    if (b.from === i) pull += d.atoms[b.to]!.x - a.x;
    if (b.to === i) pull += d.atoms[b.from]!.x - a.x;
  }
  const hRuns: { text: string; size: number; dy: number }[] = a.hydrogens > 0
    ? [{ text: 'H', size, dy: 0 }, ...(a.hydrogens > 1 ? [{ text: String(a.hydrogens), size: small, dy: 0.25 * size }] : [])]
    : [];
  const symbol = { text: a.element, size, dy: 0 };
  const charge = a.charge !== 0 ? [{ text: superscript(a.charge), size: small, dy: -0.45 * size }] : [];
  // Hydrogens and charge go on the side away from the bonds, so no bond runs through them.
  const left = pull > 1e-6;
  const parts = left ? [...charge, ...hRuns, symbol] : [symbol, ...hRuns, ...charge];
  const runs: TextRun[] = [];
  let dx = 0, symbolLeft = 0;
  for (const part of parts) {
    if (part === symbol) symbolLeft = dx;
    runs.push({ text: part.text, dx, dy: part.dy, sizeMm: part.size });
    dx += measureText(m, part.text, part.size);
  }
  const symbolWidth = measureText(m, a.element, size);
  const x = p.x - symbolLeft - symbolWidth / 2;
  // Cap height of the label font is about 0.73 em (DejaVu Sans): centre the capitals on the atom.
  const y = p.y + 0.365 * size;
  const item: TextItem = {
    kind: 'text', role: 'structure', x, y, colour: style.colour,
    runs: runs.map((r) => ({ ...r })),
    box: { x, y: y - m.ascent * size, w: dx, h: (m.ascent + m.descent) * size },
  };
  return { item, clip: Math.max(symbolWidth / 2, 0.4 * size) + 0.12 * size };
}

/** Bounding box of paths (grown by `pad`) and text boxes. */
export function itemsBox(items: readonly (PathItem | TextItem)[], pad: number): Box {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  const grow = (x: number, y: number, r: number) => { x0 = Math.min(x0, x - r); y0 = Math.min(y0, y - r); x1 = Math.max(x1, x + r); y1 = Math.max(y1, y + r); };
  for (const item of items) {
    if (item.kind === 'text') { grow(item.box.x, item.box.y, 0); grow(item.box.x + item.box.w, item.box.y + item.box.h, 0); continue; }
    for (const s of item.segments) if (s.op === 'M' || s.op === 'L') grow(s.x, s.y, pad);
  }
  return x0 === Infinity ? { x: 0, y: 0, w: 0, h: 0 } : { x: x0, y: y0, w: x1 - x0, h: y1 - y0 };
}
