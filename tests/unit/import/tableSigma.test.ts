import { describe, expect, it } from 'vitest';
import { importTable } from '../../../core/import/table.ts';
import { uncertainInputs } from '../../../core/uncertainty/uncertainInputs.ts';

describe('importTable: optional sigma column (issue 18)', () => {
  it('reads σ in the energy column\'s unit; an empty cell means no σ', () => {
    const result = importTable('pathway,label,kind,G [kJ/mol],sigma\nA,R,min,0,\nA,TS,ts,80.5,4.2\nA,P,min,-20,2\n');
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const energies = result.doc.pathways[0]!.points.map((p) => p.energy);
    expect(energies).toEqual([
      { mode: 'value', value: 0, unit: 'kJ/mol', quantity: 'G' },
      { mode: 'value', value: 80.5, unit: 'kJ/mol', quantity: 'G', sigma: 4.2 },
      { mode: 'value', value: -20, unit: 'kJ/mol', quantity: 'G', sigma: 2 },
    ]);
    expect(uncertainInputs(result.doc).map((i) => [i.key, i.sigma, i.unit])).toEqual([['pathway-1/p2/value', 4.2, 'kJ/mol'], ['pathway-1/p3/value', 2, 'kJ/mol']]);
  });

  it('keeps hartree σ with absolute values, so the reference\'s own σ moves every relative energy', () => {
    const result = importTable('pathway,label,kind,E [hartree],sigma\nA,R,min,-100.5,0.001\nA,TS,ts,-100.47,0.001\n');
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.doc.pathways[0]!.points.map((p) => (p.energy as { sigma?: number }).sigma)).toEqual([0.001, 0.001]);
  });

  it('names the row and the unit for a negative or unreadable σ', () => {
    const result = importTable('pathway,label,kind,G [kcal/mol],sigma\nA,R,min,0,-1\nA,TS,ts,20,abc\n');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual([
      { row: 2, column: 'sigma', value: '-1', message: 'expected a standard uncertainty ≥ 0 in kcal/mol, or an empty cell' },
      { row: 3, column: 'sigma', value: 'abc', message: 'expected a standard uncertainty ≥ 0 in kcal/mol, or an empty cell' },
    ]);
  });
});
