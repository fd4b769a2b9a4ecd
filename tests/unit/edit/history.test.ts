import { describe, expect, it } from 'vitest';
import { closeGroup, HISTORY_LIMIT, record, redo, startHistory, undo } from '../../../core/edit/history.ts';
import { setLabel } from '../../../core/edit/pointEdits.ts';
import { twoRoutes } from './fixture.ts';

const label = (doc: ReturnType<typeof twoRoutes>, text: string) => setLabel(doc, { pathway: 'p', point: 'r', label: text });

describe('history', () => {
  it('undo and redo walk through past documents', () => {
    const a = twoRoutes();
    const b = label(a, 'B');
    const c = label(b, 'C');
    let h = record(record(startHistory(a), b), c);
    h = undo(h);
    expect(h.present).toBe(b);
    h = undo(h);
    expect(h.present).toBe(a);
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present).toBe(b);
    const d = label(b, 'D');
    h = record(h, d);
    expect(h.future).toEqual([]);
    expect(redo(h)).toBe(h);
  });

  it('a typing burst in one group within the window is one undo step', () => {
    const a = twoRoutes();
    let h = startHistory(a);
    h = record(h, label(a, 'x'), { group: 'label:r', now: 1000 });
    h = record(h, label(a, 'xy'), { group: 'label:r', now: 1500 });
    h = record(h, label(a, 'xyz'), { group: 'label:r', now: 2000 });
    expect(h.past).toHaveLength(1);
    expect(undo(h).present).toBe(a);
    // A pause longer than the window, or a closed group, starts a new step.
    const later = record(h, label(a, 'late'), { group: 'label:r', now: 9000 });
    expect(later.past).toHaveLength(2);
    const closed = record(closeGroup(h), label(a, 'next'), { group: 'label:r', now: 2100 });
    expect(closed.past).toHaveLength(2);
  });

  it('recording the present changes nothing, and old steps fall off past the limit', () => {
    const a = twoRoutes();
    const h0 = startHistory(a);
    expect(record(h0, a)).toBe(h0);
    let h = h0;
    for (let i = 0; i < HISTORY_LIMIT + 5; i++) h = record(h, label(a, `n${i}`));
    expect(h.past).toHaveLength(HISTORY_LIMIT);
  });
});
