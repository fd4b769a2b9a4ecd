import { describe, expect, it } from 'vitest';
import {
  crossoverTemperatureK, equilibriumConstant, hessReaction, parseFormationTable, parseReaction,
  solveFormationValue, type FormationData, type Reaction,
} from '../../../core/thermo/index.ts';
import { fromJoulesPerMol } from '../../../core/units/energy.ts';
import { CODATA_CSV, JANAF_CSV, rel } from './helpers.ts';

function reaction(text: string): Reaction {
  const r = parseReaction(text);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}
function table(csv: string): FormationData {
  const t = parseFormationTable(csv);
  if (!t.ok) throw new Error(JSON.stringify(t.errors));
  return t.value.data;
}
const toKj = (j: number | null): number => fromJoulesPerMol(j ?? NaN, 'kJ/mol');
const T = 298.15;
const janaf = table(JANAF_CSV);

// REFERENCE.md §4, NIST-JANAF (Chase 1998) reactions; tables are rounded to 0.001, so sums are
// compared at ±0.001 kJ/mol and the two ΔrG° routes at ±0.003 kJ/mol as the sheet advises.
describe('hessReaction on NIST-JANAF reactions R1–R3', () => {
  const cases = [
    { name: 'R1 methane combustion', text: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)', dH: -890.309, dS: -242.85, dGhts: -817.9032725, dGf: -817.903, K: 1.95166899547e143, tStar: 3666.086061 },
    { name: 'R2 ammonia synthesis', text: 'N2(g) + 3 H2(g) -> 2 NH3(g)', dH: -91.796, dS: -198.101, dGhts: -32.73218685, dGf: -32.734, K: 542936.059986, tStar: 463.3797911 },
    { name: 'R3 water–gas shift', text: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', dH: -41.169, dS: -42.012, dGhts: -28.6431222, dGf: -28.644, K: 104282.560928, tStar: 979.9343045 },
  ];
  for (const c of cases) {
    it(`${c.name}: ΔrH°, ΔrS°, both ΔrG° routes, K, T*`, () => {
      const h = hessReaction(reaction(c.text), janaf, T);
      expect(Math.abs(toKj(h.dHJ) - c.dH)).toBeLessThan(1e-6);
      expect(Math.abs((h.dSJK ?? NaN) - c.dS)).toBeLessThan(1e-6);
      expect(Math.abs(toKj(h.dGJ) - c.dGhts)).toBeLessThan(1e-6);
      expect(Math.abs(toKj(h.dGFormationJ) - c.dGf)).toBeLessThan(1e-6);
      expect(Math.abs(toKj(h.dGJ) - toKj(h.dGFormationJ))).toBeLessThan(0.003);
      expect(rel(equilibriumConstant(h.dGFormationJ ?? NaN, T), c.K)).toBeLessThan(1e-9);
      expect(rel(crossoverTemperatureK(h.dHJ ?? NaN, h.dSJK ?? NaN) ?? NaN, c.tStar)).toBeLessThan(1e-9);
      expect(h.routesDisagree).toBe(false);
    });
  }

  it('exposes the route difference: R2 (ΔH − TΔS) − ΣνΔfG° = +0.001813 kJ/mol', () => {
    const h = hessReaction(reaction('N2(g) + 3 H2(g) -> 2 NH3(g)'), janaf, T);
    expect(Math.abs(toKj(h.routeDifferenceJ) - 0.00181315)).toBeLessThan(1e-6);
    // A tighter tolerance than the table rounding flags it.
    expect(hessReaction(reaction('N2(g) + 3 H2(g) -> 2 NH3(g)'), janaf, T, { toleranceJ: 1 }).routesDisagree).toBe(true);
  });

  it('flags a table whose ΔfG° does not match its ΔfH° and S°', () => {
    const bad = new Map(janaf);
    bad.set('NH3(g)', { ...janaf.get('NH3(g)'), dfG: -16.0 });
    const h = hessReaction(reaction('N2(g) + 3 H2(g) -> 2 NH3(g)'), bad, T);
    expect(h.routesDisagree).toBe(true);
    expect(toKj(h.routeDifferenceJ)).toBeCloseTo(-32.73218685 + 32.0, 6);
  });

  it('returns null and names the species when a value is missing', () => {
    const partial = new Map(janaf);
    partial.set('CH4(g)', { dfH: -74.873 });
    const h = hessReaction(reaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'), partial, T);
    expect(h.dHJ).not.toBeNull();
    expect(h.dSJK).toBeNull();
    expect(h.dGJ).toBeNull();
    expect(h.dGFormationJ).toBeNull();
    expect(h.missing).toEqual({ dfH: [], S: ['CH4(g)'], dfG: ['CH4(g)'] });
  });

  it('lists species absent from the data', () => {
    expect(hessReaction(reaction('C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(l)'), janaf, T).unknown).toEqual(['C2H6(g)']);
  });
});

describe('hessReaction with CODATA Key Values (cross-check, REFERENCE.md §4)', () => {
  // Cox, Wagman & Medvedev 1989: R2 ΔrH° = −91.88 kJ/mol, ΔrS° = −198.109 J/(mol K), ΔrG° = −32.81380165 kJ/mol,
  // T* = 463.78509 K; R3 −41.154, −42.03, −28.6227555, 979.15774 K. No ΔfG° in the Key Values.
  const codata = table(CODATA_CSV);
  it.each([
    ['N2(g) + 3 H2(g) -> 2 NH3(g)', -91.88, -198.109, -32.81380165, 463.78509],
    ['CO(g) + H2O(g) -> CO2(g) + H2(g)', -41.154, -42.03, -28.6227555, 979.15774],
  ])('%s', (text, dH, dS, dG, tStar) => {
    const h = hessReaction(reaction(text), codata, T);
    expect(Math.abs(toKj(h.dHJ) - dH)).toBeLessThan(1e-6);
    expect(Math.abs((h.dSJK ?? NaN) - dS)).toBeLessThan(1e-6);
    expect(Math.abs(toKj(h.dGJ) - dG)).toBeLessThan(1e-6);
    expect(rel(crossoverTemperatureK(h.dHJ ?? NaN, h.dSJK ?? NaN) ?? NaN, tStar)).toBeLessThan(1e-7);
    expect(h.dGFormationJ).toBeNull();
  });
  it('agrees with NIST-JANAF within the CODATA uncertainty (R2 ΔrH° ± 0.7 kJ/mol)', () => {
    const r2 = reaction('N2(g) + 3 H2(g) -> 2 NH3(g)');
    expect(Math.abs(toKj(hessReaction(r2, codata, T).dHJ) - toKj(hessReaction(r2, janaf, T).dHJ))).toBeLessThan(0.7);
  });
});

describe('crossoverTemperatureK', () => {
  it('is null when ΔrH° and ΔrS° have opposite signs (no sign change of ΔrG°)', () => {
    expect(crossoverTemperatureK(-50e3, 100)).toBeNull();
    expect(crossoverTemperatureK(50e3, -100)).toBeNull();
    expect(crossoverTemperatureK(0, 100)).toBeNull();
    expect(crossoverTemperatureK(50e3, 100)).toBe(500);
  });
});

describe('solveFormationValue', () => {
  it('recovers ΔfH°(CH4,g) = −74.873 kJ/mol from ΔrH°(R1) = −890.309 kJ/mol (NIST-JANAF, REFERENCE.md §4)', () => {
    const without = new Map(janaf);
    without.set('CH4(g)', {});
    const r = solveFormationValue(reaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'), without, 'CH4(g)', 'dfH', -890.309);
    expect(r.ok && r.value).toBeCloseTo(-74.873, 9);
  });
  it('recovers S°(NH3,g) = 192.774 J/(mol K) from ΔrS°(R2) = −198.101 (stoichiometric number 2)', () => {
    const r = solveFormationValue(reaction('N2(g) + 3 H2(g) -> 2 NH3(g)'), janaf, 'NH3(g)', 'S', -198.101);
    expect(r.ok && r.value).toBeCloseTo(192.774, 9);
  });
  it('recovers ΔfG°(CO,g) = −137.163 kJ/mol from ΔrG°(R3) = −28.644 (a reactant)', () => {
    const r = solveFormationValue(reaction('CO(g) + H2O(g) -> CO2(g) + H2(g)'), janaf, 'CO(g)', 'dfG', -28.644);
    expect(r.ok && r.value).toBeCloseTo(-137.163, 9);
  });
  it('names what blocks the solution', () => {
    const r1 = reaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)');
    const notIn = solveFormationValue(r1, janaf, 'NH3(g)', 'dfH', 0);
    expect(!notIn.ok && notIn.message).toContain("'NH3(g)' is not in the reaction");
    const partial = new Map(janaf);
    partial.set('O2(g)', { dfH: 0 });
    const missing = solveFormationValue(r1, partial, 'CH4(g)', 'S', -242.85);
    expect(!missing.ok && missing.message).toBe("cannot solve for CH4(g): species 'O2(g)' has no S° (J/(mol K))");
  });
});
