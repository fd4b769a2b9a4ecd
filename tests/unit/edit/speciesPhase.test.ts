import { describe, expect, it } from 'vitest';
import { speciesFromRow } from '../../../core/edit/speciesFromRow.ts';
import type { SpeciesRow } from '../../../core/edit/speciesColumns.ts';

const row = (phase: string): SpeciesRow => ({
  id: 'w', label: 'W', formula: '', charge: '', phase, electronic: '-76.4', singlePoint: '', hCorrection: '', gCorrection: '', dfH: '', S: '', dfG: '',
  sigma: '', correctionSigma: '', dfHSigma: '', dfGSigma: '',
});

// State symbols g, l, s, aq as chemists write them (IUPAC Green Book, from memory).
describe('species phase in the sheet', () => {
  it('reads the state symbols, with or without parentheses, and offers liquid', () => {
    expect(speciesFromRow(row('g'), undefined).species?.phase).toBe('gas');
    expect(speciesFromRow(row('(l)'), undefined).species?.phase).toBe('liquid');
    expect(speciesFromRow(row('aq'), undefined).species?.phase).toBe('solute');
    expect(speciesFromRow(row('s'), undefined).species?.phase).toBe('none');
    expect(speciesFromRow(row('liquid'), undefined).species?.phase).toBe('liquid');
  });

  it('names the accepted phases when one is not known', () => {
    expect(speciesFromRow(row('plasma'), undefined).problems).toEqual([
      { column: 'phase', value: 'plasma', message: 'expected one of solute, solvent, liquid, gas, none (or g, l, s, aq)' },
    ]);
  });
});
