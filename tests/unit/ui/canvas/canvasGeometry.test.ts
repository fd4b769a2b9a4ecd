import { describe, expect, it } from 'vitest';
import { sceneElements } from '../../../../ui/canvas/elementSink.ts';
import { sceneGeometry } from '../../../../ui/canvas/sceneGeometry.ts';
import { slotMap } from '../../../../ui/canvas/slotMap.ts';
import { shiftLevel, splitScene } from '../../../../ui/canvas/shiftLevel.ts';
import { dragEdit } from '../../../../ui/canvas/dragGesture.ts';
import { nudge } from '../../../../ui/canvas/canvasInput.ts';
import { pointSummary } from '../../../../ui/canvas/pointSummary.ts';
import { sceneToSvg } from '../../../../core/export/sceneToSvg.ts';
import { routeStore } from '../editor/storeFixture.ts';
import { sceneOf } from './sceneFixture.ts';

// 1 kcal = 4184 J (thermochemical calorie, NIST SP 811 App. B; REFERENCE.md §1).
const KCAL = 4184;

describe('canvas drawing and geometry', () => {
  it('draws one element per painted item, with the same paths the SVG export writes', () => {
    const store = routeStore();
    const scene = sceneOf(store);
    const elements = sceneElements(scene);
    expect(elements).toHaveLength(scene.items.length + (scene.background ? 1 : 0));
    const svg = sceneToSvg(scene);
    const paths = elements.filter((e) => e.type === 'path' && e.role === 'level');
    expect(paths).toHaveLength(3);
    // Same geometry as the exporter, to its rounding (3 decimals, as d3-shape tests compare).
    const nums = (d: string) => d.match(/-?\d+(\.\d+)?/g)!.map(Number);
    for (const p of paths) {
      if (p.type !== 'path') continue;
      const exported = [...svg.matchAll(/<path d="([^"]+)"/g)].map((m) => nums(m[1]!));
      expect(exported.some((e) => e.length === nums(p.d).length && e.every((v, i) => Math.abs(v - nums(p.d)[i]!) < 2e-3))).toBe(true);
    }
    expect(sceneElements(scene)[3]).toBe(elements[3]);
  });

  it('reads the energy scale off the drawn levels and turns a drag back into energy', () => {
    const store = routeStore();
    const scene = sceneOf(store);
    const geometry = sceneGeometry(scene, store.profile, slotMap(store.profile, store.doc));
    const y = (point: string) => geometry.levels.find((l) => l.point === point)!.y;
    // A at 0 and TS at 20 kcal/mol: the scale is their page distance over 20 kcal/mol.
    expect(geometry.mmPerJ).toBeCloseTo((y('t') - y('a')) / (20 * KCAL), 12);
    const up2 = dragEdit(store.doc, { pathway: 'p', point: 't', role: 'level', slot: 1 }, 'y', 0, 2 * KCAL * geometry.mmPerJ, geometry);
    expect(up2.pathways[0]!.points[1]!.energy).toEqual({ mode: 'barrier', value: 22, unit: 'kcal/mol' });
    const sideways = dragEdit(store.doc, { pathway: 'p', point: 'b', role: 'level', slot: 2 }, 'x', 0.5 * geometry.mmPerSlot, 0, geometry);
    expect(sideways.pathways[0]!.points[2]!.x).toBe(2.5);
  });

  it('moves one level, its label and the connector ends that meet it, and nothing else', () => {
    const store = routeStore();
    const scene = sceneOf(store);
    const moved = shiftLevel(scene, { pathway: 'p', point: 't', dyMm: -3 });
    const changed = moved.items.filter((item, i) => item !== scene.items[i]);
    expect(changed.some((i) => i.kind === 'path' && i.role === 'level' && i.point === 't')).toBe(true);
    expect(changed.filter((i) => i.kind === 'path' && i.role === 'connector')).toHaveLength(2);
    expect(changed.every((i) => i.point === 't' || (i.kind === 'path' && i.role === 'connector'))).toBe(true);
    const { moving, hidden } = splitScene(scene, 'p', 't');
    expect(moving.items.length).toBeGreaterThan(2);
    expect([...hidden]).toEqual(moving.items);
    expect(moving.items.every((i) => scene.items.includes(i))).toBe(true);
    expect(moving.items.every((i) => i.point === 't' || (i.kind === 'path' && i.role === 'connector'))).toBe(true);
  });

  it('arrow keys nudge by one shown decimal, Shift by ten; sideways by a tenth of a slot', () => {
    const store = routeStore();
    expect(nudge(store.doc, 'p', 't', 'ArrowUp', false, 1)!.pathways[0]!.points[1]!.energy).toMatchObject({ value: 20.1 });
    expect(nudge(store.doc, 'p', 't', 'ArrowDown', true, 1)!.pathways[0]!.points[1]!.energy).toMatchObject({ value: 19 });
    expect(nudge(store.doc, 'p', 't', 'ArrowRight', false, 1)!.pathways[0]!.points[1]!.x).toBe(1.1);
    expect(nudge(store.doc, 'p', 't', 'Home', false, 1)).toBeNull();
  });

  it('the hover summary gives energy with unit, provenance and the barrier to the next TS', () => {
    const store = routeStore();
    const a = pointSummary(store.profile, 'p', 'a', 'kcal/mol', 1)!;
    expect(a.energy).toBe('ΔG = 0.0 kcal mol⁻¹');
    expect(a.next).toBe('barrier to TS: +20.0 kcal mol⁻¹');
    expect(pointSummary(store.profile, 'p', 't', 'kcal/mol', 1)!.next).toBe('to B: −25.0 kcal mol⁻¹');
  });
});
