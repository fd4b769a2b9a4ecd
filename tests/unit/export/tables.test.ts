import { describe, expect, it } from 'vitest';
import { pointsTable, tableToCsv, tableToMarkdown, type Table } from '../../../core/export/tables.ts';
import { fixture } from '../figure/profileFixture.ts';

describe('pointsTable', () => {
  it('lists every point with its energy in the display unit, unknowns as null', () => {
    const { profile } = fixture([{ id: 'p', name: 'route', points: [['A', 'min', 0], ['TS', 'ts', 14.25], ['B', 'min', null]] }], {}, 'kJ/mol');
    const table = pointsTable(profile, 1);
    expect(table.columns[4]).toBe('ΔG / kJ mol⁻¹');
    expect(table.rows.map((r) => r[4])).toEqual([0, 14.3, null]);
    expect(table.rows.map((r) => r[3])).toEqual(['minimum', 'TS', 'minimum']);
  });
});

const sample: Table = { columns: ['name', 'value'], rows: [['a, "b"', -1.5], ['=SUM(A1)', null], ['line\nbreak', 2]] };

describe('tableToCsv', () => {
  // Quoting rules: RFC 4180 §2 (fields with commas, quotes, line breaks are quoted; quotes doubled).
  it('quotes per RFC 4180 and ends lines with CRLF', () => {
    expect(tableToCsv(sample)).toBe('name,value\r\n"a, ""b""",-1.5\r\n\'=SUM(A1),\r\n"line\nbreak",2\r\n');
  });

  // OWASP, "CSV Injection": prefix cells beginning with = + - @ so spreadsheets do not evaluate them.
  it('defuses formula-like text but leaves numbers alone', () => {
    const csv = tableToCsv({ columns: ['x'], rows: [['+cmd'], ['@x'], [-3]] });
    expect(csv.split('\r\n').slice(1, 4)).toEqual(["'+cmd", "'@x", '-3']);
  });
});

describe('tableToMarkdown', () => {
  it('writes a pipe table with escaped cells and right-aligned numbers', () => {
    const md = tableToMarkdown({ columns: ['state', 'ΔG'], rows: [['a|b', -1.5], ['c', null]] });
    expect(md).toBe('| state | ΔG |\n| --- | ---: |\n| a\\|b | \u22121.5 |\n| c | — |\n');
  });
});
