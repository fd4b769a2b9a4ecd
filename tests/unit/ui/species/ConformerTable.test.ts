import { describe, expect, it } from 'vitest';
import { tick } from 'svelte';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import SpeciesSheet from '../../../../ui/species/SpeciesSheet.svelte';
import { makeDocument } from '../../../../core/model/load.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { createFakeHost } from '../host/fakeHost.ts';

// 1 Eh = 627.5094740630558 kcal/mol (CODATA 2018, REFERENCE.md §1).
const KCAL_PER_HARTREE = 627.5094740630558;

/** An invented species SA with one conformer and thermal corrections, resolved as G at 298.15 K. */
function conformerStore(): DocumentStore {
  const doc = makeDocument({
    title: 'Invented conformers',
    species: [{ id: 'sa', label: 'SA', structures: [{ label: 'a', electronic: -400.1, hCorrection: 0.25, gCorrection: 0.2 }] }],
    pathways: [{ id: 'p', name: 'Route', points: [{ id: 'a', label: 'A', kind: 'min', energy: { mode: 'species', terms: [{ species: 'sa', count: 1 }] } }] }],
  });
  return new DocumentStore(createFakeHost().host, doc, 'conformers.passline');
}

const type = (el: HTMLElement, value: string) => fireEvent.input(el, { target: { value } });
const shares = (table: HTMLElement) => within(table).getAllByLabelText(/^Population of conformer/).map((c) => c.textContent);

describe('ConformerTable', () => {
  it('opens from the species row; adds, edits, refuses a bad cell, deletes and undoes', async () => {
    const store = conformerStore();
    render(SpeciesSheet, { store });
    const disclosure = screen.getByRole('button', { name: 'Conformers of SA (1)' });
    expect(disclosure.getAttribute('aria-expanded')).toBe('false');
    expect(screen.queryByRole('table', { name: 'Conformers of SA' })).toBeNull();
    await fireEvent.click(disclosure);
    expect(disclosure.getAttribute('aria-expanded')).toBe('true');
    const table = screen.getByRole('table', { name: 'Conformers of SA' });
    expect(document.getElementById(disclosure.getAttribute('aria-controls')!)!.contains(table)).toBe(true);
    expect(within(table).getByRole('columnheader', { name: /Population/ }).textContent).toBe('Population / % at 298.15 K from G');
    expect(shares(table)).toEqual(['100.0']);

    await fireEvent.click(screen.getByRole('button', { name: 'Add conformer to SA' }));
    expect(store.doc.species[0]!.structures.map((s) => s.label)).toEqual(['a', 'a (copy)']);
    expect(shares(table)).toEqual(['50.0', '50.0']);

    // Conformer 2 made 1.0 kcal/mol lower in G: p = 1/(1 + exp(−4184/(R·298.15))) = 0.8439
    // with R = 8.31446261815324 J/(mol K) (CODATA 2018, REFERENCE.md §1), by hand.
    await type(within(table).getByRole('textbox', { name: 'G correction, conformer 2 of SA' }), String(0.2 - 1 / KCAL_PER_HARTREE));
    store.endGroup();
    expect(shares(table)).toEqual(['15.6', '84.4']);

    const before = store.doc;
    const e1 = within(table).getByRole('textbox', { name: 'E, conformer 1 of SA' });
    await type(e1, 'abc');
    expect(store.doc).toBe(before);
    expect(e1.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('list', { name: 'Conformer cells of SA that could not be read' }).textContent).toBe('Conformer 1, E: expected a number in hartree, got "abc"');

    await fireEvent.click(within(table).getByRole('button', { name: 'Delete conformer 1 of SA' }));
    expect(store.doc.species[0]!.structures.map((s) => s.label)).toEqual(['a (copy)']);
    expect(shares(table)).toEqual(['100.0']);
    expect(within(table).getByRole('button', { name: 'Delete conformer 1 of SA' }).hasAttribute('disabled')).toBe(true);
    // The refused "abc" does not linger in the row that took conformer 1's place.
    expect((within(table).getByRole('textbox', { name: 'E, conformer 1 of SA' }) as HTMLInputElement).value).toBe('-400.1');
    expect(screen.getByRole('button', { name: 'Conformers of SA (1)' })).toBeTruthy();

    store.undo();
    await tick();
    expect(store.doc.species[0]!.structures).toHaveLength(2);
    expect(shares(screen.getByRole('table', { name: 'Conformers of SA' }))).toEqual(['15.6', '84.4']);
  });

  it('a pasted block of conformer rows with one bad cell adds nothing and marks the cell', async () => {
    const store = conformerStore();
    render(SpeciesSheet, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'Conformers of SA (1)' }));
    const field = screen.getByRole('textbox', { name: 'Paste conformer rows for SA' });
    const before = store.doc;
    await fireEvent.paste(field, { clipboardData: { getData: () => 'label\tE\tG correction\nb\t-400,1\t0.2\nc\t-400.1\t0.2x\n' } });
    expect(store.doc).toBe(before);
    expect(screen.getByText('Conformer 3 (from the paste, not added)')).toBeTruthy();
    expect(screen.getByRole('list', { name: 'Conformer cells of SA that could not be read' }).textContent).toBe('Conformer 3, G correction: expected a number in hartree, got "0.2x"');
    await fireEvent.paste(field, { clipboardData: { getData: () => 'label\tE\tG correction\nb\t-400,1\t0.2\n' } });
    expect(store.doc.species[0]!.structures.map((s) => [s.label, s.electronic, s.gCorrection])).toEqual([['a', -400.1, 0.2], ['b', -400.1, 0.2]]);
    expect(screen.getByRole('button', { name: 'Conformers of SA (2)' })).toBeTruthy();
  });
});

describe('ConformerTable population intervals', () => {
  it('shows each population\'s 95 % interval from the conformers\' σ, with N and the seed', async () => {
    // Two invented conformers of equal G, each E with σ = 1 kcal/mol: the percentiles of p₁ are
    // 1/(1 + exp(±1.959964·√2·σ/RT)) = 0.9 % and 99.1 % (normal quantiles through the logistic; see
    // tests/unit/uncertainty/conformerUncertainty.test.ts).
    const sigma = 1 / KCAL_PER_HARTREE;
    const doc = makeDocument({
      settings: { uncertainty: { samples: 4000, seed: 2 } },
      species: [{ id: 'sa', label: 'SA', structures: [{ label: 'a', electronic: -400.1, gCorrection: 0.2, sigma }, { label: 'b', electronic: -400.1, gCorrection: 0.2, sigma }] }],
      pathways: [{ id: 'p', name: 'Route', points: [{ id: 'a', label: 'A', kind: 'min', energy: { mode: 'species', terms: [{ species: 'sa', count: 1 }] } }] }],
    } as never);
    const store = new DocumentStore(createFakeHost().host, doc, 'conformers.passline');
    render(SpeciesSheet, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'Conformers of SA (2)' }));
    const table = screen.getByRole('table', { name: 'Conformers of SA' });
    await screen.findByText(/95 % interval .* N = 4000 Monte Carlo samples, seed 2/, undefined, { timeout: 5000 });
    const [first] = shares(table);
    const m = /^50\.0 \((\d+\.\d) to (\d+\.\d)\)$/.exec(first!);
    expect(m, first!).not.toBeNull();
    expect(Math.abs(Number(m![1]) - 0.9)).toBeLessThan(0.3);
    expect(Math.abs(Number(m![2]) - 99.1)).toBeLessThan(0.3);
    await tick();
  });
});
