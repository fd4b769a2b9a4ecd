import { describe, expect, it } from 'vitest';
import { assignSlots } from '../../../core/figure/assignSlots.ts';

const pts = (...labels: string[]) => labels.map((label) => ({ label }));

describe('assignSlots', () => {
  it('puts point i in slot i by default', () => {
    expect(assignSlots([pts('a', 'b', 'c'), pts('x', 'y', 'z')])).toEqual([[0, 1, 2], [0, 1, 2]]);
  });

  it('spreads a shorter pathway that shares nothing over the full width', () => {
    expect(assignSlots([pts('a', 'b', 'c', 'd', 'e'), pts('x', 'y', 'z')])).toEqual([[0, 1, 2, 3, 4], [0, 2, 4]]);
  });

  it('lines up states with the same label and spreads the points between them', () => {
    const [, short] = assignSlots([pts('R', 'TS1', 'I1', 'TS2', 'P'), pts('R', 'TS', 'P')]);
    expect(short).toEqual([0, 2, 4]);
  });

  it('ignores a shared label that would make slots run backwards', () => {
    const [, second] = assignSlots([pts('A', 'B', 'C'), pts('C', 'X', 'A')]);
    expect(second).toEqual([2, 3, 4]);
  });

  it('matches the k-th occurrence of a repeated label (a cycle returning to its start)', () => {
    const [, second] = assignSlots([pts('cat', 'TS', 'I', 'TS', 'cat'), pts('cat', 'TSb', 'cat')]);
    expect(second).toEqual([0, 2, 4]);
  });

  it('takes an explicit x as given and fits neighbours around it', () => {
    const [slots] = assignSlots([[{ label: 'a' }, { label: 'b' }, { label: 'c', x: 6 }, { label: 'd' }]]);
    // Spread evenly from the implicit slot −1 before the first point up to the anchor.
    expect(slots![0]).toBeCloseTo(-1 + 7 / 3, 12);
    expect(slots![1]).toBeCloseTo(-1 + 14 / 3, 12);
    expect(slots!.slice(2)).toEqual([6, 7]);
  });
});
