import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import SpeciesSheet from '../../../../ui/species/SpeciesSheet.svelte';
import { setSpeciesMolecule } from '../../../../core/edit/moleculeEdits.ts';
import { routeStore } from './storeFixture.ts';

const tsMolecule = (store: ReturnType<typeof routeStore>) => store.doc.pathways[0]!.points[1]!.molecule;

describe('a point’s structure in the mechanism editor', () => {
  it('chooses the side of its drawing, or follows the figure again', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'TS structure' }));
    const side = screen.getByRole('combobox', { name: 'Side of the drawing of TS' }) as HTMLSelectElement;
    expect(side.value).toBe('');
    expect(side.options[0]!.textContent).toBe('as the figure (above)');
    await fireEvent.change(side, { target: { value: 'below' } });
    expect(store.doc.pathways[0]!.points[1]!.moleculeSide).toBe('below');
    await fireEvent.change(side, { target: { value: '' } });
    expect('moleculeSide' in store.doc.pathways[0]!.points[1]!).toBe(false);
    expect(store.history.past).toHaveLength(2);
  });

  it('is set from a SMILES, refused with the toolkit’s message when it cannot be read, and cleared', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    const toggle = screen.getByRole('button', { name: 'TS structure' });
    expect(toggle.getAttribute('aria-expanded')).toBe('false');
    await fireEvent.click(toggle);
    const entry = screen.getByRole('group', { name: 'Structure of TS' });
    const field = within(entry).getByRole('textbox', { name: 'Structure (SMILES, molfile or XYZ) of TS' }) as HTMLInputElement;

    // An unclosed ring (from memory: a ring-bond digit needs its partner) cannot be read.
    await fireEvent.change(field, { target: { value: 'C1CC' } });
    const alert = await within(entry).findByRole('alert', {}, { timeout: 20_000 });
    expect(alert.textContent).toMatch(/^Not read: .+/);
    expect(field.value).toBe('C1CC');
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(tsMolecule(store)).toBeUndefined();
    expect(store.canUndo).toBe(false);

    // 2-pyrrolidinone, C4H7NO (formula from its structure, counted by hand).
    await fireEvent.change(field, { target: { value: 'O=C1CCCN1' } });
    await waitFor(() => expect(tsMolecule(store)).toEqual({ format: 'smiles', text: 'O=C1CCCN1' }));
    expect(within(entry).queryByRole('alert')).toBeNull();
    await waitFor(() => expect(within(entry).getByRole('img', { name: 'Drawing of C4H7NO' })).toBeTruthy());
    expect(store.drawings?.has('p\u0000t')).toBe(true);
    expect(toggle.textContent).toContain('structure ✓');

    await fireEvent.click(within(entry).getByRole('button', { name: 'Remove the structure of TS' }));
    await waitFor(() => expect(tsMolecule(store)).toBeUndefined());
    expect(store.history.past).toHaveLength(2);
  }, 30_000);
});

describe('a species’ structure in the species sheet (the same entry)', () => {
  it('refuses text the toolkit cannot read and keeps the last structure', async () => {
    const store = routeStore();
    store.apply(setSpeciesMolecule(store.doc, { species: 'sa', text: 'CCO' }));
    render(SpeciesSheet, { store, metrics: null });
    const entry = screen.getByRole('group', { name: 'Structure of SA' });
    const field = within(entry).getByRole('textbox', { name: 'Structure (SMILES, molfile or XYZ) of SA' }) as HTMLInputElement;
    await fireEvent.change(field, { target: { value: 'C1CC' } });
    expect((await within(entry).findByRole('alert', {}, { timeout: 20_000 })).textContent).toMatch(/^Not read: /);
    expect(store.doc.species[0]!.molecule).toEqual({ format: 'smiles', text: 'CCO' });
    await fireEvent.change(field, { target: { value: 'CC(=O)O' } });
    await waitFor(() => expect(store.doc.species[0]!.molecule).toEqual({ format: 'smiles', text: 'CC(=O)O' }));
    expect(within(entry).queryByRole('alert')).toBeNull();
  }, 30_000);
});
