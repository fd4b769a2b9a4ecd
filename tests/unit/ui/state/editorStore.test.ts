import { describe, expect, it } from 'vitest';
import { serializeDocument } from '../../../../core/model/load.ts';
import { setLabel } from '../../../../core/edit/pointEdits.ts';
import { routeStore } from '../editor/storeFixture.ts';

describe('DocumentStore editing', () => {
  it('records edits, undoes and redoes them, and knows when there are unsaved changes', async () => {
    const store = routeStore();
    const start = store.doc;
    expect(store.dirty).toBe(false);
    expect(store.apply(store.doc)).toBe(false);
    store.apply(setLabel(store.doc, { pathway: 'p', point: 'a', label: 'Start' }));
    expect(store.dirty).toBe(true);
    store.undo();
    expect(store.doc).toBe(start);
    expect(store.dirty).toBe(false);
    store.redo();
    expect(store.doc.pathways[0]!.points[0]!.label).toBe('Start');
    await store.save();
    expect(store.dirty).toBe(false);
  });

  it('a dropped malformed or newer file leaves the document and its history as they were', () => {
    const store = routeStore();
    store.apply(setLabel(store.doc, { pathway: 'p', point: 'a', label: 'Edited' }));
    const doc = store.doc;
    const newer = { ...JSON.parse(serializeDocument(doc)), version: 99 };
    expect(store.openText('newer.passline', JSON.stringify(newer))).toBe(false);
    expect(store.doc).toBe(doc);
    expect(store.canUndo).toBe(true);
    expect(store.problem?.errors[0]?.message).toMatch(/format version 99/);
    expect(store.openText('ok.passline', serializeDocument(doc))).toBe(true);
    expect(store.canUndo).toBe(false);
    expect(store.fileName).toBe('ok.passline');
  });
});
