import { beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import FigureCanvas from '../../../../ui/canvas/FigureCanvas.svelte';
import { routeStore } from '../editor/storeFixture.ts';
import { metrics, sceneOf } from './sceneFixture.ts';
import { layoutFigure } from '../../../../core/figure/layoutFigure.ts';

// jsdom has no ResizeObserver (Svelte's bind:clientWidth uses it); the canvas then keeps its default width.
beforeAll(() => {
  globalThis.ResizeObserver ??= class { observe() {} unobserve() {} disconnect() {} } as unknown as typeof ResizeObserver;
});

describe('FigureCanvas', () => {
  it('every drawn level is a labelled, focusable control; arrow keys nudge the focused one', async () => {
    const store = routeStore();
    render(FigureCanvas, { store, scene: sceneOf(store) });
    const ts = screen.getByRole('button', { name: 'TS (transition state, Route): ΔG = 20.0 kcal mol⁻¹' });
    expect(ts.getAttribute('tabindex')).toBe('0');
    await fireEvent.keyDown(ts, { key: 'ArrowUp' });
    await fireEvent.keyDown(ts, { key: 'ArrowUp', shiftKey: true });
    expect(store.doc.pathways[0]!.points[1]!.energy).toMatchObject({ mode: 'barrier', value: 21.1 });
    expect(store.selection).toEqual({ pathway: 'p', point: 't' });
    // Two quick nudges of one level are one undo step.
    store.undo();
    expect(store.doc.pathways[0]!.points[1]!.energy).toMatchObject({ value: 20 });
  });

  it('an energy nudge and a sideways nudge are separate undo steps', async () => {
    const store = routeStore();
    render(FigureCanvas, { store, scene: sceneOf(store) });
    const ts = screen.getByRole('button', { name: /^TS \(transition state, Route\)/ });
    await fireEvent.keyDown(ts, { key: 'ArrowUp' });
    await fireEvent.keyDown(ts, { key: 'ArrowRight' });
    expect(store.doc.pathways[0]!.points[1]!.x).toBeDefined();
    store.undo();
    expect(store.doc.pathways[0]!.points[1]!.x).toBeUndefined();
    expect(store.doc.pathways[0]!.points[1]!.energy).toMatchObject({ value: 20.1 });
  });

  it('says why an estimated level cannot be moved, and leaves it alone', async () => {
    const store = routeStore();
    const [a, t, b] = store.doc.pathways[0]!.points;
    store.apply({ ...store.doc, pathways: [{ ...store.doc.pathways[0]!, points: [a!, { ...t!, energy: { mode: 'estimate', estimate: { method: 'marcus', lambda: 40, unit: 'kcal/mol' } } }, b!] }] });
    const before = store.doc;
    render(FigureCanvas, { store, scene: sceneOf(store) });
    const ts = screen.getByRole('button', { name: /^TS \(transition state, Route\)/ });
    await fireEvent.keyDown(ts, { key: 'ArrowDown' });
    expect(store.doc).toBe(before);
    expect(screen.getByText(/Dragging is off: TS is a barrier estimate \(marcus\)/)).toBeTruthy();
  });
});

describe('FigureCanvas on a figure too small for its labels', () => {
  it('says which labels are left out and draws the selected one by hand on request', async () => {
    const store = routeStore();
    const tiny = () => layoutFigure(store.profile, store.doc, { metrics, widthMm: 16, heightMm: 9 });
    const left = tiny().omittedLabels;
    expect(left.length).toBeGreaterThan(0);
    const first = left[0]!;
    if (first.kind !== 'level') throw new Error('expected a level label to be left out');
    store.selection = { pathway: first.pathway, point: first.point };
    render(FigureCanvas, { store, scene: tiny() });
    expect(screen.getByRole('status').textContent).toMatch(/found no clear spot inside the figure/);
    await fireEvent.click(screen.getByRole('button', { name: `Draw the label “${first.label}” at its level` }));
    const point = store.doc.pathways[0]!.points.find((p) => p.id === first.point)!;
    expect(point.labelOffsetMm).toEqual({ dx: 0, dy: 0 });
    // A hand-placed label is always drawn.
    expect(tiny().omittedLabels.some((o) => o.kind === 'level' && o.point === first.point)).toBe(false);
  });
});

describe('FigureCanvas connectors', () => {
  it('a step is one labelled control; picking either half describes its step with barriers, ΔrG and k', async () => {
    // Route fixture: A 0, TS +20.0, B −5.0 kcal/mol, so the step A → TS → B has ΔG‡ +20.0
    // forward, +25.0 back and ΔrG −5.0. k = (k_B T/h) exp(−ΔG‡/RT) at 298.15 K with
    // ΔG‡ = 83.68 kJ/mol: 6.212 × 10¹² s⁻¹ × exp(−33.756) = 0.0136 s⁻¹ (CODATA 2018 k_B, h, R;
    // Eyring, J. Chem. Phys. 3, 107 (1935)).
    const store = routeStore();
    render(FigureCanvas, { store, scene: sceneOf(store) });
    const expected = 'Step A → TS → B (Route): ΔG‡ +20.0 kcal mol⁻¹ forward, +25.0 kcal mol⁻¹ back; ΔrG −5.0 kcal mol⁻¹; k forward 0.0136 s⁻¹';
    // One keyboard stop for the step; the pointer picks either drawn half.
    const stop = screen.getByRole('button', { name: expected });
    const halves = document.querySelectorAll('path.step-hit');
    expect(halves).toHaveLength(2);
    await fireEvent.click(halves[1]!);
    expect(stop.getAttribute('aria-pressed')).toBe('true');
    expect(screen.getByText(expected, { selector: 'p' })).toBeTruthy();
    await fireEvent.keyDown(stop, { key: 'Enter' });
    expect(screen.queryByText(expected, { selector: 'p' })).toBeNull();
  });
});
