import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import FigureOptions from '../../../../ui/figure/FigureOptions.svelte';
import { routeStore } from '../editor/storeFixture.ts';

describe('FigureOptions', () => {
  it('edits the title and the figure settings, each as an undoable step', async () => {
    const store = routeStore();
    render(FigureOptions, { store });
    await fireEvent.input(screen.getByRole('textbox', { name: 'Title' }), { target: { value: 'Renamed' } });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Connectors' }), { target: { value: 'curve' } });
    await fireEvent.click(screen.getByRole('checkbox', { name: 'legend' }));
    expect(store.doc.title).toBe('Renamed');
    expect(store.doc.figure).toMatchObject({ connector: 'curve', showLegend: false });
    store.undo();
    expect(store.doc.figure.showLegend).toBe(true);
  });

  it('refuses a font size of zero in place', async () => {
    const store = routeStore();
    render(FigureOptions, { store });
    const field = screen.getByRole('textbox', { name: 'Font size' });
    await fireEvent.focus(field);
    await fireEvent.input(field, { target: { value: '0' } });
    expect(screen.getByRole('alert').textContent).toBe('font size 0 pt is outside 2 to 72 pt');
    expect(store.doc.figure.fontSizePt).toBe(8);
  });

  it('sets whether, where and how large structures are drawn, and clears the size back to automatic', async () => {
    const store = routeStore();
    render(FigureOptions, { store });
    await fireEvent.click(screen.getByRole('checkbox', { name: 'drawn beside their levels' }));
    expect(store.doc.figure.molecules).toEqual({ show: false, side: 'above' });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Side' }), { target: { value: 'below' } });
    expect(store.doc.figure.molecules?.side).toBe('below');
    const size = screen.getByRole('textbox', { name: 'Largest side of a structure drawing' });
    await fireEvent.focus(size);
    await fireEvent.input(size, { target: { value: '12' } });
    expect(store.doc.figure.molecules?.sizeMm).toBe(12);
    await fireEvent.input(size, { target: { value: '' } });
    expect(store.doc.figure.molecules).toEqual({ show: false, side: 'below' });
    store.undo();
    expect(store.doc.figure.molecules?.sizeMm).toBe(12);
  });
});
