import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import SettingsBar from '../../../../ui/components/SettingsBar.svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { setReference } from '../../../../core/edit/referenceEdits.ts';
import { setSettings } from '../../../../core/edit/settingsEdits.ts';
import { routeStore } from '../editor/storeFixture.ts';
import type { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';

/** The settings bar wired to a store as the app does; props follow the store after each edit. */
function renderBar(store: DocumentStore) {
  const props = () => ({
    doc: store.doc, referenceText: store.profile.reference?.text,
    onchange: (patch: Parameters<typeof setSettings>[1]) => { store.apply(setSettings(store.doc, patch)); void view.rerender(props()); },
    onreference: (reference: Parameters<typeof setReference>[1]['reference']) => { store.apply(setReference(store.doc, { reference })); void view.rerender(props()); },
  });
  const view = render(SettingsBar, props());
  return view;
}
const summary = () => screen.getByRole('button', { name: /^Measured from/ });
const panel = () => screen.getByRole('group', { name: 'What energies are measured from' });

describe('ReferencePicker', () => {
  it('says what energies are measured from and switches to a point of the document, one undo step', async () => {
    const store = routeStore();
    renderBar(store);
    expect(summary().textContent).toContain('the document-wide zero');
    await fireEvent.click(summary());
    expect(panel().textContent).toContain('Now: one document-wide zero');
    await fireEvent.click(within(panel()).getByRole('radio', { name: /A point/ }));
    // Nothing changes until a point is picked.
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    const select = within(panel()).getByRole('combobox', { name: 'Reference point' }) as HTMLSelectElement;
    expect([...select.querySelectorAll('optgroup')].map((g) => g.label)).toEqual(['Route']);
    await fireEvent.change(select, { target: { value: JSON.stringify(['p', 't']) } });
    expect(store.doc.settings.reference).toEqual({ kind: 'point', pathway: 'p', point: 't' });
    expect(summary().textContent).toContain('“TS” (Route)');
    expect(panel().textContent).toContain('Now: every pathway measured from "TS" (Route)');
    // A at 0 under a barrier of 20 kcal/mol over A: −20 from TS (invented route, storeFixture).
    expect(store.profile.pathways[0]!.points[0]!.energyJ! / 4184).toBeCloseTo(-20, 9);
    await fireEvent.click(within(panel()).getByRole('radio', { name: /One document-wide zero/ }));
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    store.undo();
    expect(store.doc.settings.reference).toEqual({ kind: 'point', pathway: 'p', point: 't' });
    store.undo();
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    expect(store.canUndo).toBe(false);
  });

  it('keeps a bad species sum in its field with the reason, and takes a good one', async () => {
    const store = routeStore();
    renderBar(store);
    await fireEvent.click(summary());
    await fireEvent.click(within(panel()).getByRole('radio', { name: /A sum of species/ }));
    const field = within(panel()).getByRole('textbox', { name: 'Reference species sum' }) as HTMLInputElement;
    await fireEvent.input(field, { target: { value: '2 sa + cat' } });
    await fireEvent.keyDown(field, { key: 'Enter' });
    expect(within(panel()).getByRole('alert').textContent).toBe('no species with id "cat" (known: sa)');
    expect(field.value).toBe('2 sa + cat');
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    await fireEvent.input(field, { target: { value: ' + ' } });
    await fireEvent.click(within(panel()).getByRole('button', { name: 'Use this sum' }));
    expect(within(panel()).getByRole('alert').textContent).toBe('expected at least one species, e.g. "2 cat + sub"');
    await fireEvent.input(field, { target: { value: 'SA' } });
    await fireEvent.keyDown(field, { key: 'Enter' });
    expect(within(panel()).getByRole('alert').textContent).toBe('"SA" is a label; write the species id "sa"');
    await fireEvent.input(field, { target: { value: '2 sa' } });
    await fireEvent.keyDown(field, { key: 'Enter' });
    expect(within(panel()).queryByRole('alert')).toBeNull();
    expect(store.doc.settings.reference).toEqual({ kind: 'species', terms: [{ species: 'sa', count: 2 }] });
    expect(summary().textContent).toContain('2 SA');
    expect(store.history.past).toHaveLength(1);
  });

  it('shows the legacy first-point reference only while it is the current one, explained', async () => {
    const store = routeStore();
    store.apply(setReference(store.doc, { reference: { kind: 'first' } }));
    renderBar(store);
    expect(summary().textContent).toContain('each pathway’s first point');
    await fireEvent.click(summary());
    const first = within(panel()).getByRole('radio', { name: /Each pathway’s own first point/ }) as HTMLInputElement;
    expect(first.checked).toBe(true);
    expect(panel().textContent).toContain('kept from an older document');
    await fireEvent.click(within(panel()).getByRole('radio', { name: /One document-wide zero/ }));
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    expect(within(panel()).queryByRole('radio', { name: /Each pathway’s own first point/ })).toBeNull();
  });

  it('deleting the reference point falls back to the document-wide zero and says so', async () => {
    const store = routeStore();
    store.apply(setReference(store.doc, { reference: { kind: 'point', pathway: 'p', point: 't' } }));
    render(MechanismPanel, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete TS' }));
    expect(store.doc.settings.reference).toEqual({ kind: 'zero' });
    expect(store.status).toBe('“TS” (Route) was the reference point and is gone: energies are now measured from the document-wide zero. Undo brings both back.');
    store.undo();
    expect(store.doc.settings.reference).toEqual({ kind: 'point', pathway: 'p', point: 't' });
  });
});
