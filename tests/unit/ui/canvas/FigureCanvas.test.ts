import { beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import FigureCanvas from '../../../../ui/canvas/FigureCanvas.svelte';
import { routeStore } from '../editor/storeFixture.ts';
import { sceneOf } from './sceneFixture.ts';

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
