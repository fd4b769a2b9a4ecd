import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { routeStore } from '../editor/storeFixture.ts';

// Check values computed outside the app from CODATA 2018: Eₕ = 4.3597447222071 × 10⁻¹⁸ J,
// e = 1.602176634 × 10⁻¹⁹ C, N_A = 6.02214076 × 10²³ mol⁻¹; 1 kcal = 4184 J (thermochemical).
// 20 kcal/mol = 0.0318720288 Eₕ = 0.867282085 eV; −5 kcal/mol = −0.0079680072 Eₕ = −0.216820521 eV.

describe('energies in hartree and eV stay readable with Decimals 1', () => {
  it('mechanism table cell after switching the display unit to hartree, then eV', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    const cell = (label: string) => within(screen.getAllByRole('row').find((r) => (within(r).queryAllByRole('textbox')[0] as HTMLInputElement | undefined)?.value === label)!).getAllByRole('cell')[4]!.textContent?.trim();
    store.apply({ ...store.doc, settings: { ...store.doc.settings, unit: 'hartree' } });
    await fireEvent.focus(document.body);
    expect(cell('TS')).toBe('0.031872');
    expect(cell('B')).toBe('−0.007968');
    store.apply({ ...store.doc, settings: { ...store.doc.settings, unit: 'eV' } });
    await fireEvent.focus(document.body);
    expect(cell('TS')).toBe('0.867');
    expect(cell('B')).toBe('−0.217');
  });
});
