import { describe, expect, it } from 'vitest';
import { importTable } from '../../../core/import/table.ts';
import { convertEnergy } from '../../../core/units/energy.ts';

function imported(text: string) {
  const result = importTable(text);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.doc;
}

function failure(text: string) {
  const result = importTable(text);
  if (result.ok) throw new Error('expected the import to fail');
  return result.errors;
}

describe('importTable', () => {
  it('reads pathways, kinds, energies and the cycle flag in row order', () => {
    const doc = imported('pathway,label,kind,G [kcal/mol],cycle\nOpen,R,min,0,no\nOpen,TS,ts,20.5,no\nLoop,C,min,0,yes\nLoop,T,ts,12,yes\nLoop,C′,min,-3,yes\n');
    expect(doc.settings.quantity).toBe('G');
    expect(doc.pathways.map((p) => [p.name, p.cycle, p.points.length])).toEqual([['Open', false, 2], ['Loop', true, 3]]);
    expect(doc.pathways[0]!.points[1]).toMatchObject({ label: 'TS', kind: 'ts', energy: { mode: 'value', value: 20.5, unit: 'kcal/mol', quantity: 'G' } });
  });

  it('handles a BOM, Windows line ends, blank lines and quoted fields with commas', () => {
    const doc = imported('\uFEFFpathway,label,kind,H [kJ/mol]\r\n"Route, thermal","A, open",min,0\r\n\r\n"Route, thermal",TS,ts,"95.25"\r\n');
    expect(doc.settings.quantity).toBe('H');
    expect(doc.settings.unit).toBe('kJ/mol');
    expect(doc.pathways[0]!.name).toBe('Route, thermal');
    expect(doc.pathways[0]!.points.map((p) => p.label)).toEqual(['A, open', 'TS']);
  });

  it('reads tab- and semicolon-separated pastes, with decimal commas where the delimiter allows', () => {
    expect(imported('pathway\tlabel\tkind\tG [eV]\nA\tR\tmin\t0\nA\tT\tts\t0.75\n').pathways[0]!.points[1]!.energy).toMatchObject({ value: 0.75, unit: 'eV' });
    expect(imported('pathway;label;kind;G [kcal/mol]\nA;R;min;0\nA;T;ts;12,5\n').pathways[0]!.points[1]!.energy).toMatchObject({ value: 12.5 });
    expect(imported('pathway,label,kind,G [kcal/mol]\nA,R,min,0\nA,T,ts,\u221212.5\n').pathways[0]!.points[1]!.energy).toMatchObject({ value: -12.5 });
  });

  it('makes absolute hartree energies relative to one document-wide zero: the table\'s first row', () => {
    const doc = imported('pathway,label,kind,E [hartree]\nA,R,min,-500.250000\nA,T,ts,-500.218125\nB,S,min,-500.300000\nB,P,min,-500.310000\n');
    const [a, b] = doc.pathways;
    const ts = a!.points[1]!.energy as { value: number; unit: string };
    expect(ts.unit).toBe('hartree');
    // 0.031875 E_h = 20.0021 kcal/mol with CODATA 2018 (627.5094740630558 kcal/mol per E_h, REFERENCE.md §1)
    expect(convertEnergy(ts.value, 'hartree', 'kcal/mol')).toBeCloseTo(0.031875 * 627.5094740630558, 6);
    // Old behaviour re-zeroed B to its own first row (0); on the common zero it is −500.30 − (−500.25) E_h.
    expect((b!.points[0]!.energy as { value: number }).value).toBeCloseTo(-0.05, 9);
    expect(doc.settings.unit).toBe('kcal/mol');
    expect(doc.settings.reference).toEqual({ kind: 'zero' });
  });

  it('a reference column names the shared zero; hartree values are relative to that row', () => {
    const doc = imported('pathway,label,kind,E [hartree],reference\nA,R,min,-500.25,no\nA,T,ts,-500.218125,no\nB,S,min,-500.26,yes\n');
    expect(doc.settings.reference).toEqual({ kind: 'point', pathway: 'pathway-2', point: 'p1' });
    expect((doc.pathways[0]!.points[0]!.energy as { value: number }).value).toBeCloseTo(0.01, 12);
    expect(failure('pathway,label,kind,G [kcal/mol],reference\nA,R,min,0,yes\nA,P,min,1,yes\n')[0]!.message).toContain('only one row can be the reference');
  });

  it('names line, column and value of every bad cell and imports nothing', () => {
    const errors = failure('pathway,label,kind,G [kcal/mol],cycle\nA,R,min,0,no\nA,T,saddle,abc,no\nA,P,min,1,maybe\n');
    expect(errors).toEqual([
      { row: 3, column: 'kind', value: 'saddle', message: 'expected "min" or "ts"' },
      { row: 3, column: 'G [kcal/mol]', value: 'abc', message: 'expected a number' },
      { row: 4, column: 'cycle', value: 'maybe', message: 'expected yes or no' },
    ]);
  });

  it('keeps line numbers right after blank lines and multi-line quoted cells', () => {
    const errors = failure('pathway,label,kind,G [kcal/mol]\n\nA,"two\nlines",min,0\nA,T,ts,x\n');
    expect(errors[0]).toMatchObject({ row: 5, value: 'x' });
  });

  it('explains a bad header: unknown column, unknown unit, missing columns', () => {
    expect(failure('pathway,label,kind,G [kcal/mol],note\nA,R,min,0,x\n')[0]).toMatchObject({ column: 'note', message: expect.stringContaining('unknown column') });
    expect(failure('pathway,label,kind,G [cal/g]\n')[0]).toMatchObject({ value: 'cal/g', message: expect.stringContaining('unknown energy unit') });
    expect(failure('label,kind\nR,min\n').map((e) => e.column)).toEqual(['pathway', 'energy']);
    expect(failure('')[0]!.message).toContain('empty');
  });

  it('refuses conflicting cycle flags within one pathway', () => {
    expect(failure('pathway,label,kind,G [kcal/mol],cycle\nA,R,min,0,yes\nA,T,ts,5,no\n')[0]).toMatchObject({ row: 3, column: 'cycle', message: expect.stringContaining('marked yes on line 2') });
  });
});
