import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { routeStore } from './storeFixture.ts';
import { insertPathway } from '../../../../core/edit/pathwayEdits.ts';

/** The mechanism row whose label field holds `label`. */
const rowOf = (label: string) => screen.getAllByRole('row').find((r) => (within(r).queryAllByRole('textbox')[0] as HTMLInputElement | undefined)?.value === label)!;
const energyCell = (label: string) => within(rowOf(label)).getAllByRole('cell')[4]!.textContent?.trim();

describe('MechanismPanel', () => {
  it('shows each point with its energy input and the resolved energy in the display unit', () => {
    render(MechanismPanel, { store: routeStore() });
    const table = screen.getByRole('table', { name: 'Route' });
    expect(within(table).getByRole('columnheader', { name: 'ΔG / kcal mol⁻¹' })).toBeTruthy();
    expect(energyCell('TS')).toBe('20.0');
    expect(energyCell('B')).toBe('−5.0');
  });

  it('typing a barrier re-resolves the point; a non-number is refused in place', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    const field = screen.getByRole('textbox', { name: 'TS energy' });
    await fireEvent.focus(field);
    await fireEvent.input(field, { target: { value: '22.5' } });
    expect(energyCell('TS')).toBe('22.5');
    await fireEvent.input(field, { target: { value: '22,5x' } });
    expect(screen.getByRole('alert').textContent).toBe('expected a number');
    expect(store.doc.pathways[0]!.points[1]!.energy).toMatchObject({ mode: 'barrier', value: 22.5 });
  });

  it('switching a barrier to a typed value keeps the level where it is', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy given as' }), { target: { value: 'value' } });
    expect(store.doc.pathways[0]!.points[1]!.energy).toEqual({ mode: 'value', value: 20, unit: 'kcal/mol' });
    expect(energyCell('TS')).toBe('20.0');
  });

  it('insert, delete and reorder points; every edit is one undo step', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete TS' }));
    expect(store.doc.pathways[0]!.points.map((p) => p.label)).toEqual(['A', 'B']);
    await fireEvent.click(screen.getByRole('button', { name: 'Move A down' }));
    expect(store.doc.pathways[0]!.points.map((p) => p.label)).toEqual(['B', 'A']);
    await fireEvent.click(screen.getByRole('button', { name: 'Insert a point after B' }));
    expect(store.doc.pathways[0]!.points.map((p) => p.label)).toEqual(['B', 'P3', 'A']);
    store.undo(); store.undo(); store.undo();
    expect(store.doc.pathways[0]!.points.map((p) => p.label)).toEqual(['A', 'TS', 'B']);
    expect(store.canUndo).toBe(false);
  });

  it('pathway controls: cycle flag, visibility and a new pathway', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('checkbox', { name: 'catalytic cycle' }));
    expect(store.doc.pathways[0]!.cycle).toBe(true);
    await fireEvent.click(screen.getByRole('checkbox', { name: 'shown' }));
    expect(store.doc.pathways[0]!.style.visible).toBe(false);
    await fireEvent.click(screen.getByRole('button', { name: 'Add pathway' }));
    expect(screen.getByRole('region', { name: 'Pathway Pathway 2' })).toBeTruthy();
  });

  it('at start-up builds no pathway until told, then one per task; later pathways appear at once', async () => {
    const store = routeStore();
    store.apply(insertPathway(store.doc));
    store.apply(insertPathway(store.doc));
    const deferred = render(MechanismPanel, { store, pathwaysShown: false });
    const pathways = () => screen.queryAllByRole('region').map((r) => r.getAttribute('aria-label')).filter((name) => name?.startsWith('Pathway '));
    const nextTask = () => new Promise((r) => setTimeout(r, 0));
    await nextTask();
    expect(pathways()).toEqual([]);
    expect(screen.getByText('Loading the pathways…')).toBeTruthy();
    await deferred.rerender({ store, pathwaysShown: true });
    await nextTask();
    expect(pathways()).toEqual(['Pathway Route']);
    expect(screen.getByText('Loading the other pathways…')).toBeTruthy();
    await nextTask();
    await nextTask();
    expect(pathways()).toEqual(['Pathway Route', 'Pathway Pathway 2', 'Pathway Pathway 3']);
    expect(screen.queryByText(/Loading/)).toBeNull();
    await fireEvent.click(screen.getByRole('button', { name: 'Add pathway' }));
    expect(pathways()).toHaveLength(4);
  });
});
