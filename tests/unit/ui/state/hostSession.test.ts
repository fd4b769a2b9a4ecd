import { afterEach, describe, expect, it, vi } from 'vitest';
import { makeDocument, parseDocument, serializeDocument } from '../../../../core/model/load.ts';
import { setLabel } from '../../../../core/edit/pointEdits.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { HostSession } from '../../../../ui/state/hostSession.svelte.ts';
import { AUTOSAVE_INTERVAL_MS } from '../../../../ui/host/autosaveScheduler.ts';
import { createFakeHost } from '../host/fakeHost.ts';

// An invented one-point document.
const doc = () => makeDocument({ title: 'Invented', pathways: [{ id: 'p', name: 'Route', points: [{ id: 'a', label: 'A', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } }] }] });

afterEach(() => { vi.useRealTimers(); });

describe('HostSession', () => {
  it('answers the close question with whether there are unsaved changes', async () => {
    const fake = createFakeHost();
    const store = new DocumentStore(fake.host, doc(), 'route.passline');
    const session = new HostSession(store, fake.host, () => {});
    await session.handle({ kind: 'closeRequested' });
    store.apply(setLabel(store.doc, { pathway: 'p', point: 'a', label: 'B' }));
    await session.handle({ kind: 'closeRequested' });
    expect(fake.closeReplies).toEqual([{ dirty: false, name: 'route.passline' }, { dirty: true, name: 'route.passline' }]);
    await session.handle({ kind: 'saveThenClose' });
    expect(fake.closeReplies.at(-1)).toEqual({ dirty: false, name: 'route.passline' });
  });

  it('keeps a working copy of unsaved changes and clears it once saved', async () => {
    vi.useFakeTimers();
    const fake = createFakeHost();
    const store = new DocumentStore(fake.host, doc(), 'route.passline');
    const session = new HostSession(store, fake.host, () => {});
    store.apply(setLabel(store.doc, { pathway: 'p', point: 'a', label: 'Edited' }));
    session.track();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_INTERVAL_MS + 1);
    const copy = fake.autosaved[0];
    expect(copy?.name).toBe('route.passline');
    const reread = parseDocument(copy!.text);
    expect(reread.ok && reread.doc.pathways[0]!.points[0]!.label).toBe('Edited');
    await store.save();
    session.track();
    await vi.advanceTimersByTimeAsync(1);
    expect(fake.autosaved.at(-1)).toBeNull();
  });

  it('restores a recovered copy as unsaved work, and menu export picks the format', async () => {
    const fake = createFakeHost();
    const kept = setLabel(doc(), { pathway: 'p', point: 'a', label: 'Recovered' });
    fake.setOffer({ name: 'route.passline', path: '/x/route.passline', text: serializeDocument(kept), savedAt: '2026-01-02T03:04:05Z' });
    const store = new DocumentStore(fake.host, doc(), 'demo.passline');
    const kinds: (string | undefined)[] = [];
    const session = new HostSession(store, fake.host, (kind) => kinds.push(kind));
    const stop = session.start();
    await vi.waitFor(() => expect(session.recovery).not.toBeNull());
    await session.restore();
    expect(store.doc.pathways[0]!.points[0]!.label).toBe('Recovered');
    expect(store.dirty).toBe(true);
    expect(store.filePath).toBe('/x/route.passline');
    await session.handle({ kind: 'export', format: 'markdown' });
    expect(kinds).toEqual(['points-md']);
    stop();
  });
});
