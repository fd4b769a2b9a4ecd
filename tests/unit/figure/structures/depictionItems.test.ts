import { describe, expect, it } from 'vitest';
import type { PathItem, TextItem } from '../../../../core/figure/scene.ts';
import { depictionItems } from '../../../../core/figure/structures/depictionItems.ts';
import { loadStructureToolkit } from '../../../../core/structure/loadStructureToolkit.ts';
import { fontMetrics } from '../fontFixture.ts';

const toolkit = await loadStructureToolkit();
// OpenChemLib's first layout is slow (it starts its templates): do it before the timed tests.
toolkit.read({ format: 'smiles', text: 'c1ccccc1' });
const style = { bondMm: 3, strokeMm: 0.2, labelMm: 2, colour: '#000000', metrics: fontMetrics(), pathway: 'a', point: 'p', group: 'structure a p' };

function draw(smiles: string, partialBonds?: [number, number][]) {
  const read = toolkit.read({ format: 'smiles', text: smiles, ...(partialBonds ? { partialBonds } : {}) });
  if (!read.ok) throw new Error(read.message);
  const { items, box } = depictionItems(read.value.depiction, style, 10, 10);
  const paths = items.filter((i): i is PathItem => i.kind === 'path');
  const texts = items.filter((i): i is TextItem => i.kind === 'text');
  const lines = (p: PathItem | undefined) => (p ? p.segments.filter((s) => s.op === 'M').length : 0);
  return { items, box, paths, texts, lines, solid: paths.find((p) => p.stroke && !p.stroke.dashMm) };
}

describe('depictionItems', () => {
  it('draws benzene as six ring bonds and three inner lines, with no labels', () => {
    const { solid, texts, lines } = draw('c1ccccc1');
    expect(lines(solid)).toBe(9);
    expect(texts).toHaveLength(0);
  });

  it('labels heteroatoms with their hydrogens on the side away from the bond', () => {
    const { texts } = draw('CO');
    expect(texts).toHaveLength(1);
    const text = texts[0]!.runs.map((r) => r.text).join('');
    expect(['OH', 'HO']).toContain(text);
  });

  it('writes a charge as a smaller raised run, and lone atoms with all their hydrogens', () => {
    const { texts } = draw('[NH4+]');
    const runs = texts[0]!.runs;
    expect(runs.map((r) => r.text)).toEqual(['N', 'H', '4', '+']);
    expect(runs[3]!.sizeMm).toBeLessThan(runs[0]!.sizeMm);
    expect(runs[3]!.dy).toBeLessThan(0);
    expect(runs[2]!.dy).toBeGreaterThan(0);
  });

  it('fills wedges, dashes partial bonds, and tags every item with the point and group', () => {
    const atom = (x: number) => ({ x, y: 0, element: 'C', hydrogens: 0, charge: 0, mapNo: 0 });
    const bond = (stereo: 'wedge' | 'hash') => ({ from: 0, to: 1, order: 1 as const, stereo, partial: false });
    const wedge = { items: depictionItems({ atoms: [atom(0), atom(1)], bonds: [bond('wedge')] }, style, 0, 0).items };
    expect(wedge.items).toMatchObject([{ kind: 'path', fill: '#000000', segments: [{ op: 'M' }, { op: 'L' }, { op: 'L' }, { op: 'Z' }] }]);
    const hash = depictionItems({ atoms: [atom(0), atom(1)], bonds: [bond('hash')] }, style, 0, 0).items;
    expect(hash).toHaveLength(1);
    expect((hash[0] as PathItem).segments.filter((s) => s.op === 'M')).toHaveLength(6);
    const ts = draw('[Cl:1][CH3:2][Br:3]', [[1, 2], [2, 3]]);
    expect(ts.lines(ts.paths.find((p) => p.stroke?.dashMm))).toBe(2);
    for (const item of [...wedge.items, ...ts.items]) expect(item).toMatchObject({ role: 'structure', pathway: 'a', point: 'p', group: 'structure a p' });
  });

  it('reports a box that holds every item', () => {
    const { items, box } = draw('CC(=O)[O-]');
    for (const item of items) {
      if (item.kind === 'text') expect(item.box.x).toBeGreaterThanOrEqual(box.x - 1e-9);
      else for (const s of item.segments) if (s.op !== 'Z' && s.op !== 'C') { expect(s.x).toBeGreaterThanOrEqual(box.x); expect(s.y).toBeLessThanOrEqual(box.y + box.h); }
    }
  });
});
