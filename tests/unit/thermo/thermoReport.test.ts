import { describe, expect, it } from 'vitest';
import { thermoReport, type ThermoReportResult } from '../../../core/thermo/index.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { JANAF_CSV, rel } from './helpers.ts';

const R1 = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)';
const R2 = 'N2(g) + 3 H2(g) -> 2 NH3(g)';
const R3 = 'CO(g) + H2O(g) -> CO2(g) + H2(g)';

function report(table: string, reaction: string, t: number): ThermoReportResult {
  const r = thermoReport(table, reaction, t);
  if (!r.ok) throw new Error(r.message);
  return r.result;
}
function failure(table: string, reaction: string, t = 298.15): string {
  const r = thermoReport(table, reaction, t);
  if (r.ok) throw new Error('expected a failure');
  return r.message;
}

describe('thermoReport at 298.15 K (NIST-JANAF, REFERENCE.md §4)', () => {
  it('R2: numbers in kJ/mol and J/(mol K), K from ΔrH° − TΔrS° = 542539.092802 (REFERENCE.md §9), ΣνΔfG° K = 542936.059986 beside it', () => {
    const r = report(JANAF_CSV, R2, 298.15);
    expect(Object.keys(r).sort()).toEqual(['K', 'KBasis', 'KfromFormation', 'crossoverK', 'dG', 'dGfromFormation', 'dH', 'dS', 'temperatureK', 'warnings']);
    expect(r.KBasis).toBe('dH-TdS');
    expect(rel(r.K ?? NaN, 542539.092802)).toBeLessThan(1e-9);
    expect(rel(r.KfromFormation ?? NaN, 542936.059986)).toBeLessThan(1e-9);
    // K = exp(−dG/RT) with the reported dG (the old K did not satisfy this).
    expect(rel(r.K!, Math.exp(-r.dG! * 1000 / (GAS_CONSTANT * 298.15)))).toBeLessThan(1e-12);
    expect(r.temperatureK).toBe(298.15);
    expect(r.dH).toBeCloseTo(-91.796, 9);
    expect(r.dS).toBeCloseTo(-198.101, 9);
    expect(r.dG).toBeCloseTo(-32.73218685, 8);
    expect(r.dGfromFormation).toBeCloseTo(-32.734, 9);
    expect(rel(r.crossoverK ?? NaN, 463.3797911)).toBeLessThan(1e-9);
    expect(r.warnings.some((w) => w.includes('formal only'))).toBe(true);
    expect(r.warnings.some((w) => w.includes('approximation'))).toBe(false);
  });

  it('R1: K from ΔrG° = −817.9032725 kJ/mol, T* = 3666 K formal only, and the exotherm caution', () => {
    const r = report(JANAF_CSV, R1, 298.15);
    // REFERENCE.md §4 R1: ΔrH° − TΔrS° = −817.9032725 kJ/mol; ΣνΔfG° gives K = 1.95166899547e+143.
    expect(rel(r.K ?? NaN, Math.exp(817903.2725 / (GAS_CONSTANT * 298.15)))).toBeLessThan(1e-9);
    expect(rel(r.KfromFormation ?? NaN, 1.95166899547e143)).toBeLessThan(1e-9);
    expect(rel(r.crossoverK ?? NaN, 3666.086061)).toBeLessThan(1e-9);
    expect(r.warnings.join('\n')).toMatch(/3666\.1 K is formal only/);
    expect(r.warnings.join('\n')).toContain('not a process-safety assessment');
  });

  it('R3: ΣνΔfG° K = 104282.560928 beside K from ΔrH° − TΔrS° and no disagreement warning (routes agree to table rounding)', () => {
    const r = report(JANAF_CSV, R3, 298.15);
    expect(rel(r.KfromFormation ?? NaN, 104282.560928)).toBeLessThan(1e-9);
    expect(rel(r.K ?? NaN, Math.exp(28643.1222 / (GAS_CONSTANT * 298.15)))).toBeLessThan(1e-9);
    expect(r.warnings.some((w) => w.includes('routes'))).toBe(false);
  });

  it('works from ΣνΔfG° alone when the table has only that column', () => {
    const r = report('species,dfG [kJ/mol]\nN2(g),0\nH2(g),0\nNH3(g),-16.367', R2, 298.15);
    expect(r.dH).toBeNull();
    expect(r.dG).toBeNull();
    expect(r.KBasis).toBe('dfG');
    expect(rel(r.K ?? NaN, 542936.059986)).toBeLessThan(1e-9);
    expect(r.crossoverK).toBeNull();
    expect(r.warnings.join('\n')).toContain('the table has no ΔfH° (kJ/mol) column');
  });

  it('warns when the two ΔrG° routes disagree beyond 0.01 kJ/mol', () => {
    const r = report(JANAF_CSV.replace('NH3(g),-45.898,192.774,-16.367', 'NH3(g),-45.898,192.774,-16.0'), R2, 298.15);
    expect(r.warnings.join('\n')).toContain('differ by');
  });
});

describe('thermoReport K(T) is continuous across 298.15 K', () => {
  it('K(298.15) and K(298.16) differ as van \'t Hoff says, not by the 7e-4 step between the two ΔrG° routes', () => {
    const a = report(JANAF_CSV, R2, 298.15), b = report(JANAF_CSV, R2, 298.16);
    // van 't Hoff (REFERENCE.md §9): ln(K2/K1) = −(ΔrH°/R)(1/T2 − 1/T1) with ΔrH° = −91.796 kJ/mol.
    const expected = Math.exp((91796 / GAS_CONSTANT) * (1 / 298.16 - 1 / 298.15));
    expect(rel(b.K! / a.K!, expected)).toBeLessThan(1e-9);
    expect(a.KBasis).toBe(b.KBasis);
  });
});

describe('thermoReport beyond the floating-point range', () => {
  it('gives K = null and log10 K in a warning when exp(−ΔrG°/RT) overflows', () => {
    // Invented ΔfG° of −2000 kJ/mol: ln K = 806.8 > ln(Number.MAX_VALUE) = 709.8.
    const r = report('species,dfG [kJ/mol]\nC(s),0\nO2(g),0\nCO2(g),-2000', 'C(s) + O2(g) -> CO2(g)', 298.15);
    expect(r.K).toBeNull();
    expect(r.warnings.join('\n')).toContain(`log10 K = ${(2e6 / (GAS_CONSTANT * 298.15) / Math.LN10).toFixed(3)}`);
  });
});

describe('thermoReport at other temperatures (REFERENCE.md §9)', () => {
  it('R2 at 400 K: K = 43.6074912142 from ΔrH° − TΔrS°, ΣνΔfG° not used, approximation stated', () => {
    const r = report(JANAF_CSV, R2, 400);
    expect(rel(r.K ?? NaN, 43.6074912142)).toBeLessThan(1e-9);
    expect(r.dGfromFormation).toBeNull();
    expect(r.dG).toBeCloseTo(-91.796 + 400 * 0.198101, 9);
    expect(r.warnings.join('\n')).toContain('approximation: 298.15 K formation data used at 400 K');
    // NIST-JANAF at 400 K gives K = 35.645 (log10 Kf(NH3) = 0.776); the constant-ΔH model overestimates by ≈ 22 %.
    expect(r.K! / 35.645113).toBeGreaterThan(1.2);
    expect(r.K! / 35.645113).toBeLessThan(1.25);
  });
});

describe('thermoReport errors are one line naming the problem', () => {
  it('unknown species', () => {
    expect(failure(JANAF_CSV, 'C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(l)')).toBe("unknown species 'C2H6(g)': not in the table (names must match, phase included)");
  });
  it('imbalance', () => {
    expect(failure(JANAF_CSV, 'CH4(g) + O2(g) -> CO2(g) + 2 H2O(l)')).toBe('reaction: unbalanced: 2 more O on the right');
  });
  it('missing value needed for K', () => {
    const table = JANAF_CSV.replace('CH4(g),-74.873,186.251,-50.768', 'CH4(g),-74.873,,');
    const m = failure(table, R1, 350);
    expect(m).toBe('cannot compute ΔrG° at 350 K: no S° (J/(mol K)) for CH4(g) (row 2)');
    expect(failure(table, R1)).toContain('no ΔfG° (kJ/mol) for CH4(g) (row 2)');
  });
  it('a bad table cell', () => {
    expect(failure('species,dfH [kJ/mol]\nA,x\nB,y', 'A -> B')).toBe("table row 2, column 'dfH [kJ/mol]': 'x' is not a number (and 1 more)");
  });
  it('a bad reaction and a bad temperature', () => {
    expect(failure(JANAF_CSV, 'CH4(g) + O2(g)')).toContain('no arrow');
    expect(failure(JANAF_CSV, R2, -5)).toContain('temperature');
  });
});
