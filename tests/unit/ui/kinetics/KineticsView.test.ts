import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import KineticsView from '../../../../ui/kinetics/KineticsView.svelte';
import { routeStore } from '../editor/storeFixture.ts';

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

  it('scans the rate constant over a temperature range on a log axis', () => {
    render(KineticsView, { store: routeStore(), onsimulated: () => {} });
    expect(screen.getByRole('img', { name: 'Forward rate constants against temperature' })).toBeTruthy();
    expect(screen.getByText(/G values held at their input temperature/)).toBeTruthy();
  });
});
