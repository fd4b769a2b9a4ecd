import { describe, expect, it, vi } from 'vitest';
import * as scanModule from '../../../../core/analysis/scanDocument.ts';
import { fireEvent, render, screen } from '@testing-library/svelte';
import KineticsView from '../../../../ui/kinetics/KineticsView.svelte';
import { routeStore } from '../editor/storeFixture.ts';
import { makeDocument } from '../../../../core/model/load.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { createFakeHost } from '../host/fakeHost.ts';

// The real scan, counted: the view must scan once per change, not keep rescanning itself.
vi.mock('../../../../core/analysis/scanDocument.ts', async (original) => {
  const real = await original<typeof import('../../../../core/analysis/scanDocument.ts')>();
  return { ...real, scanDocument: vi.fn(real.scanDocument) };
});

describe('KineticsView', () => {
  it('simulates the chosen pathway from the given start and reports the conversion', async () => {
    const store = routeStore();
    const onsimulated = vi.fn();
    render(KineticsView, { store, onsimulated });
    expect((screen.getByRole('combobox', { name: 'Pathway' }) as HTMLSelectElement).value).toBe('p');
    const until = screen.getByRole('textbox', { name: 'Simulated time span' });
    await fireEvent.focus(until);
    await fireEvent.input(until, { target: { value: '1000' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Run simulation' }));
    // A → B through a 20 kcal/mol barrier: k = 0.0135881500479 s⁻¹ (REFERENCE.md §2) and the
    // reverse barrier is 25, so after 1000 s conversion is 1 − exp(−13.59) ≈ 100.0 % (first order).
    expect(screen.getByText(/Conversion of A at 1000 s: 100\.0 %/)).toBeTruthy();
    expect(screen.getByRole('img', { name: 'Concentrations against time' })).toBeTruthy();
    expect(onsimulated).toHaveBeenCalledWith('p', null);
  });

  it('scans the rate constant over a temperature range on a log axis', async () => {
    render(KineticsView, { store: routeStore(), onsimulated: () => {} });
    expect(await screen.findByRole('img', { name: 'Forward rate constants against temperature' })).toBeTruthy();
    expect(screen.getByText(/G values held at their input temperature/)).toBeTruthy();
  });

  it('plots K or the product shares of a selectivity comparison on request', async () => {
    // Two invented competing routes from A (TS 15 and 16 kcal/mol); the share values are
    // checked in tests/unit/analysis/scanDocument.test.ts, here only what is offered and drawn.
    const route = (id: string, ts: number) => ({ id, name: id, points: [
      { id: `${id}-a`, label: 'A', kind: 'min' as const, energy: { mode: 'value' as const, value: 0, unit: 'kcal/mol' as const } },
      { id: `${id}-t`, label: `TS-${id}`, kind: 'ts' as const, energy: { mode: 'value' as const, value: ts, unit: 'kcal/mol' as const } },
      { id: `${id}-p`, label: `P-${id}`, kind: 'min' as const, energy: { mode: 'value' as const, value: -3, unit: 'kcal/mol' as const } },
    ] });
    const doc = makeDocument({ pathways: [route('x', 15), route('y', 16)], comparisons: [{ type: 'selectivity', pathways: ['x', 'y'], enantiomeric: false }] });
    render(KineticsView, { store: new DocumentStore(createFakeHost().host, doc, 'routes.passline'), onsimulated: () => {} });
    const plot = await screen.findByRole('combobox', { name: 'Plot' });
    expect([...(plot as HTMLSelectElement).options].map((o) => o.textContent)).toEqual(['forward rate constants', 'equilibrium constants', 'product shares']);
    await fireEvent.change(plot, { target: { value: 'share' } });
    expect(screen.getByRole('img', { name: 'Product shares against temperature' })).toBeTruthy();
    await fireEvent.change(plot, { target: { value: 'K' } });
    expect(screen.getByRole('img', { name: 'Equilibrium constants against temperature' })).toBeTruthy();
  });

  it('scans once after a change and not at all while its tab is hidden', async () => {
    const scans = vi.mocked(scanModule.scanDocument);
    scans.mockClear();
    const hidden = render(KineticsView, { store: routeStore(), onsimulated: () => {}, active: false });
    await new Promise((r) => setTimeout(r, 400));
    expect(scans).not.toHaveBeenCalled();
    hidden.unmount();
    render(KineticsView, { store: routeStore(), onsimulated: () => {} });
    await screen.findByRole('img', { name: 'Forward rate constants against temperature' });
    await new Promise((r) => setTimeout(r, 600));
    expect(scans).toHaveBeenCalledTimes(1);
  });
});
