import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import UncertaintyPanel from '../../../../ui/analysis/UncertaintyPanel.svelte';
import { routeStore } from '../editor/storeFixture.ts';

const box = (name: string) => screen.getByRole('textbox', { name }) as HTMLInputElement;
async function type(field: HTMLInputElement, text: string) {
  await fireEvent.focus(field);
  await fireEvent.input(field, { target: { value: text } });
}

describe('the document-wide σ settings in the uncertainty panel', () => {
  it('the default σ starts off (empty), takes a value, converts with its unit and clears back to off', async () => {
    const store = routeStore();
    render(UncertaintyPanel, { store });
    const field = box('Default σ for entered energies');
    expect(field.value).toBe('');
    expect(field.placeholder).toBe('off');
    await type(field, '1.5');
    expect(store.doc.settings.uncertainty).toMatchObject({ defaultSigma: 1.5, defaultSigmaUnit: 'kcal/mol' });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Unit of the default σ' }), { target: { value: 'kJ/mol' } });
    // 1.5 kcal/mol × 4.184 = 6.276 kJ/mol (thermochemical calorie, NIST SP 811 App. B.8).
    expect(store.doc.settings.uncertainty).toMatchObject({ defaultSigmaUnit: 'kJ/mol' });
    expect(store.doc.settings.uncertainty!.defaultSigma).toBeCloseTo(6.276, 9);
    await type(field, '');
    expect(store.doc.settings.uncertainty!.defaultSigma).toBeUndefined();
    expect('defaultSigma' in store.doc.settings.uncertainty!).toBe(false);
  });

  it('a negative default σ is refused by name; samples and seed take whole numbers only', async () => {
    const store = routeStore();
    render(UncertaintyPanel, { store });
    const before = store.doc;
    await type(box('Default σ for entered energies'), '-2');
    expect(screen.getByRole('alert').textContent).toMatch(/^default σ: expected a standard uncertainty ≥ 0/);
    expect(store.doc).toBe(before);
    await type(box('Monte Carlo samples'), '2500');
    await type(box('Random seed'), '7');
    expect(store.doc.settings.uncertainty).toMatchObject({ samples: 2500, seed: 7 });
    await type(box('Random seed'), '7.5');
    expect(store.doc.settings.uncertainty!.seed).toBe(7);
  });
});
