import { describe, expect, it } from 'vitest';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { makeDocument, parseDocument, serializeDocument } from '../../../../core/model/load.ts';
import { createFakeHost } from '../host/fakeHost.ts';

// Invented two-point profiles; 1 kcal = 4184 J (thermochemical calorie, NIST SP 811 App. B,
// as in REFERENCE.md §1).
const docWithBarrier = (title: string, barrier: number) => makeDocument({
  title,
  pathways: [{
    id: 'p', name: 'Route', points: [
      { id: 'a', label: 'A', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
      { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'value', value: barrier, unit: 'kcal/mol' } },
    ],
  }],
});

describe('DocumentStore', () => {
  it('resolves the document it starts with (energies in J/mol)', () => {
    const store = new DocumentStore(createFakeHost().host, docWithBarrier('First', 12), 'first.passline');
    expect(store.profile.pathways[0]?.points[1]?.energyJ).toBeCloseTo(12 * 4184, 9);
  });

  it('replaces the document and its resolution when a valid file is opened', async () => {
    const text = serializeDocument(docWithBarrier('Second', 20));
    const { host } = createFakeHost([{ name: 'second.passline', path: '/x/second.passline', text }]);
    const store = new DocumentStore(host, docWithBarrier('First', 12), 'first.passline');
    await store.open();
    expect(store.doc.title).toBe('Second');
    expect(store.fileName).toBe('second.passline');
    expect(store.filePath).toBe('/x/second.passline');
    expect(store.profile.pathways[0]?.points[1]?.energyJ).toBeCloseTo(20 * 4184, 9);
    expect(store.status).toBe('Opened second.passline.');
  });

  it('keeps the document untouched and lists the errors when a malformed file is opened', async () => {
    const broken = JSON.parse(serializeDocument(docWithBarrier('Broken', 1)));
    broken.pathways[0].points[1].kind = 'peak';
    const { host } = createFakeHost([{ name: 'broken.passline', text: JSON.stringify(broken) }]);
    const initial = docWithBarrier('First', 12);
    const store = new DocumentStore(host, initial, 'first.passline');
    await store.open();
    expect(store.doc).toBe(initial);
    expect(store.problem?.fileName).toBe('broken.passline');
    expect(store.problem?.errors[0]?.path).toBe('pathways[0].points[1].kind');
    expect(store.status).toMatch(/broken\.passline was not opened: 1 problem found/);
    store.dismissProblem();
    expect(store.problem).toBeNull();
  });

  it('reports a failing host without a stack and keeps the document', async () => {
    const { host } = createFakeHost([new Error("Error invoking remote method 'passline:open-document': Error: could not read x.passline (EACCES)")]);
    const initial = docWithBarrier('First', 12);
    const store = new DocumentStore(host, initial, 'first.passline');
    await store.open();
    expect(store.doc).toBe(initial);
    expect(store.status).toBe('Could not open: could not read x.passline (EACCES)');
    expect(store.busy).toBe(false);
  });

  it('says so when opening is cancelled', async () => {
    const store = new DocumentStore(createFakeHost([null]).host, docWithBarrier('First', 12), 'first.passline');
    await store.open();
    expect(store.status).toBe('Open cancelled.');
  });

  it('saves text that loads as the same document, then saves back in place', async () => {
    const { host, saved } = createFakeHost();
    const initial = docWithBarrier('Amide coupling', 12);
    const store = new DocumentStore(host, initial, 'untitled');
    await store.saveAs();
    expect(saved[0]?.suggestedName).toBe('untitled.passline');
    expect(saved[0]?.path).toBeUndefined();
    const reloaded = parseDocument(saved[0]!.text);
    expect(reloaded.ok && reloaded.doc).toEqual(initial);
    expect(store.filePath).toBe('/fake/untitled.passline');
    await store.save();
    expect(saved[1]?.path).toBe('/fake/untitled.passline');
    expect(store.status).toBe('Saved untitled.passline.');
  });

  it('keeps its file name when saving is cancelled', async () => {
    const { host } = createFakeHost([], [null]);
    const store = new DocumentStore(host, docWithBarrier('First', 12), 'first.passline');
    await store.saveAs();
    expect(store.fileName).toBe('first.passline');
    expect(store.status).toBe('Save cancelled.');
  });
});
