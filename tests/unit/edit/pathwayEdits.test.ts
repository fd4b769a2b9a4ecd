import { describe, expect, it } from 'vitest';
import { deletePathway, duplicatePathway, insertPathway, movePathway, setCycle, setPathwayName, setStyle } from '../../../core/edit/pathwayEdits.ts';
import { setFigure, setSettings, settingsProblem } from '../../../core/edit/settingsEdits.ts';
import { expectLoadable, twoRoutes } from './fixture.ts';

describe('pathway edits', () => {
  it('insert, duplicate and move keep ids unique and order as asked', () => {
    const doc = twoRoutes();
    const added = insertPathway(doc, { index: 0 });
    expect(added.pathways.map((p) => p.id)).toEqual(['pathway-3', 'p', 'q']);
    const copied = duplicatePathway(doc, { pathway: 'p' });
    expect(copied.pathways.map((p) => p.name)).toEqual(['Route', 'Route copy', 'Other']);
    expect(movePathway(doc, { pathway: 'q', to: 0 }).pathways.map((p) => p.id)).toEqual(['q', 'p']);
    expectLoadable(copied);
  });

  it('deleting a pathway drops the comparisons and annotations that name it', () => {
    const next = deletePathway(twoRoutes(), { pathway: 'q' });
    expect(next.comparisons).toEqual([]);
    expect(next.pathways.map((p) => p.id)).toEqual(['p']);
    expectLoadable(next);
    expectLoadable(deletePathway(twoRoutes(), { pathway: 'p' }));
  });

  it('cycle flag, name and style; a bad colour is refused', () => {
    const doc = twoRoutes();
    expect(setCycle(doc, { pathway: 'p', cycle: true }).pathways[0]!.cycle).toBe(true);
    expect(setCycle(doc, { pathway: 'p', cycle: false })).toBe(doc);
    expect(setPathwayName(doc, { pathway: 'p', name: 'Main' }).pathways[0]!.name).toBe('Main');
    const styled = setStyle(doc, { pathway: 'p', style: { colour: '#AA0011', dash: 'dotted', visible: false } });
    expect(styled.pathways[0]!.style).toEqual({ colour: '#aa0011', dash: 'dotted', visible: false });
    expect(setStyle(doc, { pathway: 'p', style: { colour: 'red' } })).toBe(doc);
    expect(setStyle(styled, { pathway: 'p', style: { colour: null } }).pathways[0]!.style.colour).toBeUndefined();
    expectLoadable(styled);
  });
});

describe('settings edits', () => {
  it('change quantity, unit, temperature and standard state; keep typed values in their unit', () => {
    const doc = twoRoutes();
    const next = setSettings(doc, { quantity: 'H', unit: 'kJ/mol', temperatureK: 350, standardState: '1atm-to-1M' });
    expect(next.settings).toMatchObject({ quantity: 'H', unit: 'kJ/mol', temperatureK: 350, standardState: '1atm-to-1M' });
    expect(next.pathways).toBe(doc.pathways);
    expect(setSettings(doc, { unit: 'kcal/mol' })).toBe(doc);
  });

  it('refuse a temperature at or below 0 K with a message', () => {
    const doc = twoRoutes();
    expect(setSettings(doc, { temperatureK: 0 })).toBe(doc);
    expect(settingsProblem(doc.settings, { temperatureK: -5 })).toMatch(/temperatureK: temperature -5 K is outside 1 to 10000 K/);
    expect(setFigure(doc, { theme: 'dark' }).figure.theme).toBe('dark');
    expect(setFigure(doc, { fontSizePt: -1 })).toBe(doc);
  });
});
