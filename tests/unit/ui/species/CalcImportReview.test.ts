import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within, waitFor } from '@testing-library/svelte';
import SpeciesSheet from '../../../../ui/species/SpeciesSheet.svelte';
import { makeDocument } from '../../../../core/model/load.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { createFakeHost } from '../host/fakeHost.ts';

const fixture = (name: string) => readFileSync(`${process.cwd()}/tests/fixtures/qc/${name}`, 'utf8');
const FREQ = fixture('g16-dvb-freq.log'); // cut from cclib's Gaussian 16 dvb_ir.out (tests/fixtures/qc/SOURCES.md)

function sheet() {
  const store = new DocumentStore(createFakeHost().host, makeDocument({ title: 'Outputs' }), 'outputs.passline');
  render(SpeciesSheet, { store });
  return store;
}

const drop = (files: File[]) => fireEvent.drop(screen.getByRole('region', { name: 'Species' }), { dataTransfer: { files } });

// The first render pays the component compile and warm-up; on a loaded machine that exceeds 5 s.
describe('reading output files on the species sheet', { timeout: 30_000 }, () => {
  it('shows a review table first and adds the species (and a pathway) only on "Add"', async () => {
    const store = sheet();
    await drop([new File([FREQ], 'int1_freq.log'), new File([FREQ.replace('-382.308266602', '-382.300000000')], 'ts1.log')]);
    const table = await screen.findByRole('table', { name: 'Species read from output files' });
    expect(store.doc.species).toEqual([]);
    const rows = within(table).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent!.trim()));
    expect(rows[0]!).toEqual(['int1 C10H10', 'int1_freq.log Gaussian 16 A.03', 'b3lyp/sto-3g', '-382.308267', '0.186960', '0.143352', '298.15', '0', 'normal']);
    await fireEvent.click(screen.getByRole('checkbox', { name: /also add a pathway/ }));
    await fireEvent.click(screen.getByRole('button', { name: 'Add 2 species' }));
    expect(store.doc.species.map((s) => s.id)).toEqual(['int1', 'ts1']);
    expect(store.doc.species[0]!.structures[0]!.source!.files[0]!.file).toBe('int1_freq.log');
    expect(store.doc.pathways.at(-1)!.points.map((p) => [p.label, p.kind])).toEqual([['int1', 'min'], ['ts1', 'min']]);
    expect(screen.queryByRole('table', { name: 'Species read from output files' })).toBeNull();
    store.undo();
    expect(store.doc.species).toEqual([]);
  });

  it('recomputes the corrections with the chosen low-mode treatment', async () => {
    sheet();
    await drop([new File([FREQ], 'int1.log')]);
    const table = await screen.findByRole('table', { name: 'Species read from output files' });
    const g = () => within(table).getAllByRole('row')[1]!.querySelectorAll('td')[5]!.textContent;
    expect(g()).toBe('0.143352');
    await fireEvent.change(screen.getByRole('combobox', { name: 'Low-mode treatment' }), { target: { value: 'grimme' } });
    await waitFor(() => expect(g()).not.toBe('0.143352'));
  });

  it('is all or nothing: an unreadable file blocks "Add" and is named', async () => {
    const store = sheet();
    await drop([new File([FREQ], 'int1.log'), new File(['shopping list'], 'notes.txt')]);
    const errors = await screen.findByRole('list', { name: 'Files that keep the import back' });
    expect(errors.textContent).toContain('notes.txt: not a Gaussian log, an ORCA output or an XYZ file');
    expect((screen.getByRole('button', { name: 'Add 1 species' }) as HTMLButtonElement).disabled).toBe(true);
    await fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(store.doc.species).toEqual([]);
  });
});
