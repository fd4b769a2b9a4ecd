import { describe, expect, it } from 'vitest';
import { bepBarrier, bepFromPair } from '../../../core/thermo/index.ts';
import { kcal, toKcal } from './helpers.ts';

// REFERENCE.md §7: Bell, Proc. R. Soc. Lond. A 154, 414 (1936); Evans & Polanyi, Trans. Faraday Soc. 34, 11 (1938).
// E₀ = 15.0 kcal/mol, α = 0.40.
describe('bepBarrier', () => {
  it.each([[-12, 10.2], [0, 15.0], [5, 17.0]])('ΔH = %s kcal/mol → E_a = %s kcal/mol', (dH, ea) => {
    const b = bepBarrier(kcal(15), 0.4, kcal(dH));
    expect(toKcal(b.barrierJ)).toBeCloseTo(ea, 12);
    expect(b.alphaOutOfRange).toBe(false);
    expect(b.belowThermodynamicLimit).toBe(false);
  });
  it('flags α outside [0, 1]', () => {
    expect(bepBarrier(kcal(15), 1.2, kcal(-5)).alphaOutOfRange).toBe(true);
    expect(bepBarrier(kcal(15), -0.1, kcal(-5)).alphaOutOfRange).toBe(true);
    expect(bepBarrier(kcal(15), 1, kcal(-5)).alphaOutOfRange).toBe(false);
  });
  it('flags an estimate below max(0, ΔH) (REFERENCE.md §7 sanity rule, common practice)', () => {
    // Endothermic by 30 kcal/mol: 15 + 0.4·30 = 27 < 30.
    expect(bepBarrier(kcal(15), 0.4, kcal(30)).belowThermodynamicLimit).toBe(true);
    // Strongly exothermic: 15 + 0.4·(−50) = −5 < 0.
    expect(bepBarrier(kcal(15), 0.4, kcal(-50)).belowThermodynamicLimit).toBe(true);
  });
});

describe('bepFromPair', () => {
  it('(−10.0, 11.0) and (+4.0, 16.6) kcal/mol give α = 0.40, E₀ = 15.0', () => {
    const fit = bepFromPair({ deltaHJ: kcal(-10), barrierJ: kcal(11) }, { deltaHJ: kcal(4), barrierJ: kcal(16.6) });
    expect(fit?.alpha).toBeCloseTo(0.4, 12);
    expect(toKcal(fit?.e0J ?? NaN)).toBeCloseTo(15, 12);
  });
  it('is null for equal ΔH', () => {
    expect(bepFromPair({ deltaHJ: 1, barrierJ: 2 }, { deltaHJ: 1, barrierJ: 3 })).toBeNull();
  });
});
