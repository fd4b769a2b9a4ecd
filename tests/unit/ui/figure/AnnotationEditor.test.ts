import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import FigureOptions from '../../../../ui/figure/FigureOptions.svelte';
import { setCycle } from '../../../../core/edit/pathwayEdits.ts';
import { routeStore } from '../editor/storeFixture.ts';

const list = () => screen.getByRole('list', { name: 'Annotations on the figure' });

describe('AnnotationEditor (Figure tab)', () => {
  it('adds a barrier arrow between two chosen points, lists it and removes it', async () => {
    const store = routeStore();
    render(FigureOptions, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Arrow from' }), { target: { value: 'a' } });
    await fireEvent.change(screen.getByRole('combobox', { name: 'to' }), { target: { value: 't' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Add annotation' }));
    expect(store.doc.figure.annotations).toEqual([{ type: 'barrier', pathway: 'p', from: 'a', to: 't' }]);
    expect(within(list()).getByText(/Barrier arrow A → TS \(Route\)/)).toBeTruthy();
    // The same arrow twice is refused (the button is off).
    expect((screen.getByRole('button', { name: 'Add annotation' }) as HTMLButtonElement).disabled).toBe(true);
    await fireEvent.click(screen.getByRole('button', { name: /^Remove annotation 1/ }));
    expect(store.doc.figure.annotations).toEqual([]);
    store.undo();
    expect(store.doc.figure.annotations).toHaveLength(1);
  });

  it('the span bracket says why a pathway that is not a cycle cannot carry it, then adds it on a cycle', async () => {
    // Energetic span is defined for catalytic cycles (Kozuch & Shaik, Acc. Chem. Res. 2011, 44, 101).
    const store = routeStore();
    render(FigureOptions, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'New annotation' }), { target: { value: 'span' } });
    expect(screen.getByRole('status').textContent).toBe('pathway "Route" is not marked as a catalytic cycle');
    store.apply(setCycle(store.doc, { pathway: 'p', cycle: true }));
    await fireEvent.click(await screen.findByRole('button', { name: 'Add annotation' }));
    expect(store.doc.figure.annotations).toEqual([{ type: 'span', pathway: 'p' }]);
  });

  it('adds free text at x in slots and y in the display unit', async () => {
    const store = routeStore();
    render(FigureOptions, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'New annotation' }), { target: { value: 'text' } });
    await fireEvent.input(screen.getByRole('textbox', { name: 'Text' }), { target: { value: 'slow step' } });
    const x = screen.getByRole('textbox', { name: 'Text x (slots)' });
    await fireEvent.focus(x);
    await fireEvent.input(x, { target: { value: '1.5' } });
    const y = screen.getByRole('textbox', { name: 'Text y (kcal mol⁻¹)' });
    await fireEvent.focus(y);
    await fireEvent.input(y, { target: { value: '18' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Add annotation' }));
    expect(store.doc.figure.annotations).toEqual([{ type: 'text', text: 'slow step', x: 1.5, y: 18 }]);
  });
});

describe('AnnotationEditor with a hidden pathway', () => {
  it('says an annotation on a hidden pathway is not drawn and shows the pathway on request', async () => {
    const store = routeStore();
    store.apply({ ...store.doc, figure: { ...store.doc.figure, annotations: [{ type: 'barrier', pathway: 'p', from: 'a', to: 't' }] } });
    store.apply({ ...store.doc, pathways: [{ ...store.doc.pathways[0]!, style: { ...store.doc.pathways[0]!.style, visible: false } }] });
    render(FigureOptions, { store });
    expect(within(list()).getByText('— not drawn: pathway "Route" is hidden.')).toBeTruthy();
    await fireEvent.click(within(list()).getByRole('button', { name: 'Show Route' }));
    expect(store.doc.pathways[0]!.style.visible).toBe(true);
    expect(within(list()).queryByText(/not drawn/)).toBeNull();
  });
});
