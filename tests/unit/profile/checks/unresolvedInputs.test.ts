import { describe, expect, it } from 'vitest';
import { markUnresolved, RESTS_ON_UNRESOLVED } from '../../../../core/profile/checks/unresolvedInputs.ts';
import { resolveProfile } from '../../../../core/profile/resolve.ts';
import { onePathway, typed } from '../builders.ts';

// Structure only (no science): which points lose their energy when an input does not resolve.
const doc = onePathway([
  typed('R', 'min', 0),
  typed('TS1', 'ts', 20),
  { id: 'I', label: 'I', kind: 'min', energy: { mode: 'step', value: -5, unit: 'kcal/mol' } },
  { id: 'TS2', label: 'TS2', kind: 'ts', energy: { mode: 'barrier', value: 12, unit: 'kcal/mol' } },
  typed('P', 'min', -10),
]);
const input = (point: string) => ({ pathway: 'a', point, field: 'energy', text: '1e999', message: 'expected a number' });

describe('markUnresolved', () => {
  it('returns the same profile when nothing is unresolved', () => {
    const profile = resolveProfile(doc);
    expect(markUnresolved(doc, profile, [])).toBe(profile);
  });

  it('takes the energy from the point and from every point measured from it, and names the input in an error', () => {
    const marked = markUnresolved(doc, resolveProfile(doc), [input('I')]);
    const energies = marked.pathways[0]!.points.map((p) => p.energyJ === null);
    expect(energies).toEqual([false, false, true, true, false]);
    expect(marked.pathways[0]!.points[3]!.provenance.detail).toBe(RESTS_ON_UNRESOLVED);
    expect(marked.findings[0]).toMatchObject({ severity: 'error', code: 'unresolved-input', point: 'I' });
    expect(marked.findings[0]!.message).toContain('the energy of "I" reads "1e999", which does not resolve: expected a number');
  });

  it('takes every energy of the pathway when its reference does not resolve', () => {
    const marked = markUnresolved(doc, resolveProfile(doc), [input('R')]);
    expect(marked.pathways[0]!.points.every((p) => p.energyJ === null)).toBe(true);
  });
});
