import { describe, expect, it } from 'vitest';
import { analysisTables } from '../../../core/export/analysisTables.ts';
import { tableToCsv, tableToMarkdown } from '../../../core/export/tables.ts';
import { analysedDocument } from './analysisFixture.ts';

const tables = analysisTables(analysedDocument().report, 1);

describe('analysisTables', () => {
  it('names a unit in every energy, time and rate header', () => {
    for (const t of Object.values(tables)) {
      for (const c of t.columns) if (/Δ|δE|TOF|t½|barrier/.test(c)) expect(c, c).toMatch(/\/ (kcal mol⁻¹|s|s⁻¹|%)$/);
    }
    expect(tables.steps.columns).toContain('k forward unit');
  });

  // REFERENCE.md §6, Kozuch & Shaik ACR 2011, cycle A: Eyring k⁺₁ = 9.9357585046e+03 s⁻¹ (k_BT/h e^{−12/RT}),
  // δE = 22.5 kcal/mol (T3 − I2), exact TOF 1.66434592407551e-4 s⁻¹, δE approximation 1.99823985763831e-4 s⁻¹,
  // apparent barrier 22.6083266979 kcal/mol.
  it('carries the steps and energetic span of cycle A', () => {
    const first = tables.steps.rows[0]!;
    expect(first.slice(0, 5)).toEqual(['cycle A', 'I1', 'T1', 'I2', 12]);
    expect(first[7]).toBe(9936);
    expect(first[8]).toBe('s⁻¹');
    expect(tables.energeticSpans.rows).toEqual([['cycle A', 22.5, 'T3', 'I2', 1.664e-4, 1.998e-4, 22.6, -2]]);
  });

  // X_TOF of cycle A's TSs and intermediates (tests/REFERENCES.md §6: Kozuch & Shaik ACR 2011 formulas,
  // steady state by mpmath and central finite differences), shown in %, 4 significant digits.
  it('lists the degree of TOF control of every cycle state, TSs then intermediates', () => {
    const pct = (x: number) => Number((100 * x).toPrecision(4));
    expect(tables.tofControl.columns).toEqual(['cycle', 'state', 'kind', 'X_TOF / %']);
    expect(tables.tofControl.rows).toEqual([
      ...['T1', 'T2', 'T3', 'T4'].map((s, i) => ['cycle A', s, 'TS', pct([1.612168663e-5, 0.06878445147, 0.9311988761, 5.507427872e-7][i]!)]),
      ...['I1', 'I2', 'I3', 'I4'].map((s, i) => ['cycle A', s, 'intermediate', pct([3.724871973e-5, 0.9309932243, 0.06876809744, 2.01429519e-4][i]!)]),
    ]);
  });

  it('gives effective barriers and the rate comparison', () => {
    // Effective barrier of a linear profile: max over TS j and earlier minimum i of T_j − I_i (DESIGN.md; our numbers).
    expect(tables.effectiveBarriers.rows.find((r) => r[0] === 'thermal')!.slice(0, 4)).toEqual(['thermal', 27.6, 'R', 'TS']);
    const [row] = tables.comparisons.rows;
    // ΔΔG‡ = baseline − candidate effective barrier: 27.6 − 14.2.
    expect(row![2]).toBe(13.4);
    // Rate ratio exp(ΔΔG‡/RT), R = N_A k_B from CODATA 2018 (REFERENCE.md §1), 1 kcal = 4184 J (NIST SP 811).
    const R = 6.02214076e23 * 1.380649e-23;
    expect(row![3]).toBe(Number(Math.exp((13.4 * 4184) / (R * 298.15)).toPrecision(4)));
  });

  it('writes CSV and Markdown', () => {
    const csv = tableToCsv(tables.energeticSpans);
    expect(csv.split('\r\n')[1]).toBe('cycle A,22.5,T3,I2,0.0001664,0.0001998,22.6,-2');
    expect(tableToMarkdown(tables.points)).toContain('| cycle A | I1′ | minimum | −2 |');
  });
});
