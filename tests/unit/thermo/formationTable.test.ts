import { describe, expect, it } from 'vitest';
import { parseFormationTable } from '../../../core/thermo/index.ts';
import { JANAF_CSV } from './helpers.ts';

describe('parseFormationTable', () => {
  it('reads the NIST-JANAF fixture (REFERENCE.md §4) with all three columns', () => {
    const t = parseFormationTable(JANAF_CSV);
    if (!t.ok) throw new Error(JSON.stringify(t.errors));
    expect(t.value.columns).toEqual(['dfH', 'S', 'dfG']);
    expect(t.value.data.get('NH3(g)')).toEqual({ dfH: -45.898, S: 192.774, dfG: -16.367 });
    expect(t.value.rows.get('NH3(g)')).toBe(9);
  });

  it('handles a byte-order mark, CRLF, quoted cells, blank lines and empty cells', () => {
    const text = '\uFEFFspecies,dfH [kJ/mol],S [J/(mol K)],dfG [kJ/mol]\r\n\r\n"H2O(l)","-285.830",69.950,\r\n"Cu,complex",1,,2\r\n\r\n';
    const t = parseFormationTable(text);
    if (!t.ok) throw new Error(JSON.stringify(t.errors));
    expect(t.value.data.get('H2O(l)')).toEqual({ dfH: -285.83, S: 69.95 });
    expect(t.value.data.get('Cu,complex')).toEqual({ dfH: 1, dfG: 2 });
    expect(t.value.rows.get('Cu,complex')).toBe(4);
  });

  it('accepts any subset of value columns in any order', () => {
    const t = parseFormationTable('species,dfG [kJ/mol],dfH [kJ/mol]\nCO(g),-137.163,-110.527');
    expect(t.ok && t.value.columns).toEqual(['dfG', 'dfH']);
    expect(t.ok && t.value.data.get('CO(g)')).toEqual({ dfG: -137.163, dfH: -110.527 });
  });

  it('converts kcal/mol and cal/(mol K) with the thermochemical calorie (4.184 J, NIST SP 811)', () => {
    // H2O(l) NIST-JANAF values written in kcal: −285.830/4.184 kcal/mol, 69.950/4.184 cal/(mol K).
    const t = parseFormationTable(`species,dfH [kcal/mol],S [cal/(mol K)],dfG [kcal mol-1]\nH2O(l),${-285.83 / 4.184},${69.95 / 4.184},${-237.141 / 4.184}`);
    if (!t.ok) throw new Error(JSON.stringify(t.errors));
    const v = t.value.data.get('H2O(l)');
    expect(v?.dfH).toBeCloseTo(-285.83, 10);
    expect(v?.S).toBeCloseTo(69.95, 10);
    expect(v?.dfG).toBeCloseTo(-237.141, 10);
  });

  it('reads a typographic minus sign and exponents', () => {
    const t = parseFormationTable('species,dfH [kJ/mol]\nX,−1.5e2');
    expect(t.ok && t.value.data.get('X')).toEqual({ dfH: -150 });
  });

  it('reports every bad cell with row, column, value and message', () => {
    const t = parseFormationTable('species,dfH [kJ/mol],S [J/(mol K)]\nA,abc,1\nB,2,0x10\n,3,4\nA,1,1');
    expect(t.ok).toBe(false);
    if (t.ok) return;
    expect(t.errors).toEqual([
      { row: 2, column: 'dfH [kJ/mol]', value: 'abc', message: "'abc' is not a number" },
      { row: 3, column: 'S [J/(mol K)]', value: '0x10', message: "'0x10' is not a number" },
      { row: 4, column: 'species', value: '', message: 'missing species name' },
      { row: 5, column: 'species', value: 'A', message: "species 'A' is listed twice (rows 2 and 5)" },
    ]);
  });

  it('refuses headers without a unit, with an unknown unit or an unknown column', () => {
    const err = (text: string): string => { const t = parseFormationTable(text); return t.ok ? '' : t.errors.map((e) => e.message).join(' | '); };
    expect(err('species,dfH\nA,1')).toContain("column 'dfH' needs a unit");
    expect(err('species,dfH [eV]\nA,1')).toContain("unknown unit 'eV'");
    expect(err('species,Cp [J/(mol K)]\nA,1')).toContain("unknown column 'Cp [J/(mol K)]'");
    expect(err('name,dfH [kJ/mol]\nA,1')).toContain("first column must be 'species'");
    expect(err('')).toContain('empty');
  });

  it('flags cells beyond the header', () => {
    const t = parseFormationTable('species,dfH [kJ/mol]\nA,1,2');
    expect(!t.ok && t.errors[0]).toMatchObject({ row: 2, message: 'more cells than header columns' });
  });
});
