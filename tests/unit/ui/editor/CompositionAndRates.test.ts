import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { setEnergy } from '../../../../core/edit/pointEdits.ts';
import { routeStore } from './storeFixture.ts';

describe('MechanismPanel: composition and rate data', () => {
  it('a typed point is given species and counts from the species sheet, and they can be removed', async () => {
    // Composition terms as the document format defines them (core/model/schema.ts Point.composition).
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'A composition' }));
    await fireEvent.input(screen.getByRole('textbox', { name: 'A composition count' }), { target: { value: '2' } });
    await fireEvent.change(screen.getByRole('combobox', { name: 'A composition species' }), { target: { value: 'sa' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Add to A' }));
    expect(store.doc.pathways[0]!.points[0]!.composition).toEqual([{ species: 'sa', count: 2 }]);
    expect(within(screen.getByRole('list', { name: 'A composition terms' })).getByText(/2 × SA/)).toBeTruthy();
    await fireEvent.click(screen.getByRole('button', { name: 'Remove SA from A' }));
    expect(store.doc.pathways[0]!.points[0]!.composition).toBeUndefined();
  });

  it('a count that is not a positive number is reported in place and nothing changes', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'B composition' }));
    await fireEvent.input(screen.getByRole('textbox', { name: 'B composition count' }), { target: { value: '0' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Add to B' }));
    expect(screen.getByRole('alert').textContent).toBe('composition term 1: the count of sa must be a positive number, got 0');
    expect(store.doc.pathways[0]!.points[2]!.composition).toBeUndefined();
  });

  it('an Eyring-plot estimate shows its (T, k) rows; cells are edited, rows added and removed, bad cells named', async () => {
    const store = routeStore();
    store.apply(setEnergy(store.doc, { pathway: 'p', point: 't', energy: { mode: 'estimate', estimate: { method: 'eyringFit', data: [{ temperatureK: 298.15, k: 1e-3 }, { temperatureK: 318.15, k: 1e-2 }] } } }));
    render(MechanismPanel, { store });
    const table = screen.getByRole('table', { name: 'TS Eyring plot data' });
    const k2 = within(table).getByRole('textbox', { name: 'TS k, row 2' });
    await fireEvent.focus(k2);
    await fireEvent.input(k2, { target: { value: '2e-2' } });
    const est = () => (store.doc.pathways[0]!.points[1]!.energy as { estimate: { data: { temperatureK: number; k: number }[] } }).estimate.data;
    expect(est()[1]).toEqual({ temperatureK: 318.15, k: 0.02 });
    // Absolute temperature is positive (ITS-90; from memory): refused in place, document unchanged.
    const t1 = within(table).getByRole('textbox', { name: 'TS T, row 1' });
    await fireEvent.focus(t1);
    await fireEvent.input(t1, { target: { value: '-5' } });
    expect(screen.getByRole('alert').textContent).toBe('expected a positive temperature in K');
    expect(est()[0]!.temperatureK).toBe(298.15);
    expect((screen.getByRole('button', { name: 'Remove row 1 of TS Eyring plot data' }) as HTMLButtonElement).disabled).toBe(true);
    await fireEvent.click(screen.getByRole('button', { name: 'Add a (T, k) row to TS' }));
    expect(est()).toHaveLength(3);
    await fireEvent.click(screen.getByRole('button', { name: 'Remove row 1 of TS Eyring plot data' }));
    expect(est().map((r) => r.temperatureK)).toEqual([318.15, 328.15]);
  });
});
