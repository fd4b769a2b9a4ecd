import { describe, expect, it } from 'vitest';
import { dragBlockedReason, dragEnergy } from '../../../core/edit/dragEnergy.ts';
import { setSettings } from '../../../core/edit/settingsEdits.ts';
import { twoRoutes } from './fixture.ts';

// 1 kcal = 4.184 kJ exactly (thermochemical calorie, NIST SP 811 App. B; REFERENCE.md §1).
const KCAL = 4184;

describe('dragEnergy', () => {
  it('moves a barrier by the dragged amount, rounded to the document decimals', () => {
    const doc = twoRoutes();
    const next = dragEnergy(doc, { pathway: 'p', point: 't', deltaJ: 2.34 * KCAL });
    expect(next.pathways[0]!.points[1]!.energy).toEqual({ mode: 'barrier', value: 22.3, unit: 'kcal/mol' });
  });

  it('converts into the unit the value was typed in (a kJ/mol step)', () => {
    const doc = setSettings(twoRoutes(), { decimals: 2 });
    const next = dragEnergy(doc, { pathway: 'p', point: 'i', deltaJ: 1 * KCAL });
    // −5 kJ/mol + 4.184 kJ/mol = −0.816 → −0.82 at two decimals.
    expect(next.pathways[0]!.points[2]!.energy).toMatchObject({ mode: 'step', value: -0.82, unit: 'kJ/mol' });
  });

  it('never drags a species-derived energy, and says why', () => {
    const doc = twoRoutes();
    expect(dragEnergy(doc, { pathway: 'p', point: 's', deltaJ: 1000 })).toBe(doc);
    expect(dragBlockedReason(doc.pathways[0]!.points[3]!)).toMatch(/species sheet/);
    expect(dragBlockedReason(doc.pathways[0]!.points[0]!)).toBeNull();
  });

  it('a move smaller than half the last decimal changes nothing', () => {
    const doc = twoRoutes();
    expect(dragEnergy(doc, { pathway: 'p', point: 't', deltaJ: 0.04 * KCAL })).toBe(doc);
  });
});
