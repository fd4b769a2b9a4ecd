import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import SpeciesSheet from '../../../../ui/species/SpeciesSheet.svelte';
import { routeStore } from '../editor/storeFixture.ts';

const paste = (el: HTMLElement, text: string) => fireEvent.paste(el, { clipboardData: { getData: () => text } });

describe('SpeciesSheet', () => {
  it('a pasted tab-separated block with a header adds species', async () => {
    const store = routeStore();
    render(SpeciesSheet, { store });
    await paste(screen.getByRole('textbox', { name: 'Paste a block as new species' }), 'label\tE\tH correction\nCat\t-500.25\t0.31\nSub\t-230.5\t0.12');
    expect(store.doc.species.map((s) => [s.label, s.structures[0]?.electronic, s.structures[0]?.hCorrection])).toEqual([['SA', -10, undefined], ['Cat', -500.25, 0.31], ['Sub', -230.5, 0.12]]);
    expect((screen.getByRole('textbox', { name: 'E, row 3' }) as HTMLInputElement).value).toBe('-230.5');
  });

  it('a block with bad cells changes nothing and marks each bad cell by row and column', async () => {
    const store = routeStore();
    const before = store.doc;
    render(SpeciesSheet, { store });
    await paste(screen.getByRole('textbox', { name: 'E, row 1' }), '-1.5\tabc\n');
    expect(store.doc).toBe(before);
    expect(screen.getByRole('list', { name: 'Cells that could not be read' }).textContent).toContain('Row 1, E (single point): expected a number in Eh (got “abc”)');
    expect(screen.getByRole('textbox', { name: 'E (single point), row 1' }).getAttribute('aria-invalid')).toBe('true');
  });

  it('a species in use is not deleted, and the sheet says which point uses it', async () => {
    const store = routeStore();
    store.apply({ ...store.doc, pathways: [{ ...store.doc.pathways[0]!, points: [{ ...store.doc.pathways[0]!.points[0]!, energy: { mode: 'species', terms: [{ species: 'sa', count: 1 }] } }] }] });
    render(SpeciesSheet, { store });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete species sa' }));
    expect(store.doc.species).toHaveLength(1);
    expect(screen.getByText(/“sa” is used by Route: A/)).toBeTruthy();
  });
});
