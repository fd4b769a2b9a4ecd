import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import SpeciesSheet from '../../../../ui/species/SpeciesSheet.svelte';
import { setSettings } from '../../../../core/edit/settingsEdits.ts';
import { routeStore } from '../editor/storeFixture.ts';

// routeStore: one species SA with E = −10 Eh (invented).
describe('σ columns of the species sheet', () => {
  it('start folded; shown, a σ E typed in hartree lands on the structure and a negative one is named', async () => {
    const store = routeStore();
    render(SpeciesSheet, { store });
    expect(screen.queryByRole('textbox', { name: 'σ(E), row 1' })).toBeNull();
    await fireEvent.click(screen.getByRole('checkbox', { name: 'σ (standard uncertainty)' }));
    const cell = screen.getByRole('textbox', { name: 'σ(E), row 1' }) as HTMLInputElement;
    expect(screen.getByRole('columnheader', { name: /^σ\(E\)/ })).toBeTruthy();
    expect(cell.placeholder).toBe('σ');
    await fireEvent.input(cell, { target: { value: '0.0016' } });
    expect(store.doc.species[0]!.structures[0]).toEqual({ electronic: -10, sigma: 0.0016 });
    await fireEvent.input(cell, { target: { value: '-1' } });
    expect(store.doc.species[0]!.structures[0]!.sigma).toBe(0.0016);
    expect(screen.getByRole('list', { name: 'Cells that could not be read' }).textContent).toContain('Row 1, σ(E): expected a standard uncertainty ≥ 0');
  });

  it('an empty σ E cell shows the document default that applies, in hartree', () => {
    const store = routeStore();
    // 1 kcal/mol = 4184 J/mol ÷ 2625 499.6 J/mol per Eh (CODATA 2018) = 0.00159 Eh.
    store.apply(setSettings(store.doc, { uncertainty: { defaultSigma: 1, defaultSigmaUnit: 'kcal/mol', samples: 100, seed: 1 } }));
    render(SpeciesSheet, { store });
    return fireEvent.click(screen.getByRole('checkbox', { name: 'σ (standard uncertainty)' })).then(() => {
      const cell = screen.getByRole('textbox', { name: 'σ(E), row 1' }) as HTMLInputElement;
      expect(cell.placeholder).toBe('(0.0016)');
      expect(cell.title).toMatch(/default σ \(1 kcal mol⁻¹\) applies/);
    });
  });
});
