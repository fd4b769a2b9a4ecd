import { describe, expect, it } from 'vitest';
import { editRateData, MIN_RATE_ROWS } from '../../../core/edit/rateDataEdits.ts';

const rows = [{ temperatureK: 298.15, k: 1e-3 }, { temperatureK: 318.15, k: 1e-2 }];

describe('rate data edits', () => {
  it('sets one cell of one row and leaves the input untouched', () => {
    const next = editRateData(rows, { type: 'set', index: 1, k: 2.5e-2 });
    expect(next).toEqual([{ temperatureK: 298.15, k: 1e-3 }, { temperatureK: 318.15, k: 2.5e-2 }]);
    expect(rows[1]!.k).toBe(1e-2);
  });

  it('adds a row 10 K above the warmest with the last k, and removes rows down to two', () => {
    const three = editRateData(rows, { type: 'add' });
    expect(three).toEqual([...rows, { temperatureK: 328.15, k: 1e-2 }]);
    expect(editRateData(three as typeof rows, { type: 'remove', index: 0 })).toEqual([rows[1], { temperatureK: 328.15, k: 1e-2 }]);
    // A straight-line fit (Eyring: ln(k/T) vs 1/T; Arrhenius: ln k vs 1/T) needs two points
    // (Eyring, J. Chem. Phys. 1935, 3, 107; Arrhenius, Z. Phys. Chem. 1889, 4, 226).
    expect(MIN_RATE_ROWS).toBe(2);
    expect(editRateData(rows, { type: 'remove', index: 0 })).toMatch(/at least 2 \(T, k\) rows/);
  });

  it('a temperature or rate constant that is not positive is reported with its row and cell', () => {
    // Absolute temperature and rate constants are positive (thermodynamic temperature scale, ITS-90; from memory).
    expect(editRateData(rows, { type: 'set', index: 0, temperatureK: 0 })).toBe('row 1, T: expected a positive temperature in K');
    expect(editRateData(rows, { type: 'set', index: 1, k: -1 })).toBe('row 2, k: expected a positive rate constant in s⁻¹');
    expect(editRateData(rows, { type: 'set', index: 5, k: 1 })).toBe('there is no row 6');
  });
});
