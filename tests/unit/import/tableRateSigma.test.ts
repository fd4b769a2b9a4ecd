import { describe, expect, it } from 'vitest';
import { importTable } from '../../../core/import/table.ts';
import { BOUNDS } from '../../../core/model/bounds.ts';
import { uncertainInputs } from '../../../core/uncertainty/uncertainInputs.ts';

const errorsOf = (text: string) => {
  const result = importTable(text);
  if (result.ok) throw new Error('expected the import to fail');
  return result.errors;
};

describe('importTable: rate-constant and half-life columns with their σ (issue 18)', () => {
  it('turns a ts row with k and k sigma into a rate-constant estimate whose σ the Monte Carlo samples', () => {
    const result = importTable('pathway,label,kind,G [kJ/mol],k,k sigma,molecularity\nA,R,min,0,,,\nA,TS,ts,,2.5e3,500,2\nA,P,min,-10,,,\n');
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.doc.pathways[0]!.points[1]!.energy).toEqual({ mode: 'estimate', estimate: { method: 'rateConstant', k: 2500, molecularity: 2, kSigma: 500 } });
    expect(uncertainInputs(result.doc).map((i) => [i.key, i.sigma])).toEqual([[expect.stringContaining('pathway-1/p2'), 500]]);
  });

  it('reads a half-life in s with its σ, and leaves σ out when the cell is empty', () => {
    const result = importTable('pathway,label,kind,G [kcal/mol],half-life [s],half-life sigma [s]\nA,R,min,0,,\nA,TS1,ts,,3600,360\nA,I,min,2,,\nA,TS2,ts,,120,\n');
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const energies = result.doc.pathways[0]!.points.map((p) => p.energy);
    expect(energies[1]).toEqual({ mode: 'estimate', estimate: { method: 'halfLife', seconds: 3600, secondsSigma: 360 } });
    expect(energies[3]).toEqual({ mode: 'estimate', estimate: { method: 'halfLife', seconds: 120 } });
  });

  it('names row and column for a negative, unreadable or too large σ, the bound read from BOUNDS.relativeSigma', () => {
    const max = BOUNDS.relativeSigma.hard[1];
    const errors = errorsOf(`pathway,label,kind,G [kJ/mol],k,k sigma\nA,R,min,0,,\nA,TS1,ts,,100,-1\nA,TS2,ts,,100,NaN\nA,TS3,ts,,100,${100 * max * 1.5}\nA,TS4,ts,,100,${100 * max}\n`);
    expect(errors.map((e) => [e.row, e.column, e.value])).toEqual([[3, 'k sigma', '-1'], [4, 'k sigma', 'NaN'], [5, 'k sigma', String(100 * max * 1.5)]]);
    expect(errors[0]!.message).toBe('expected a standard uncertainty ≥ 0 in the unit of k, or an empty cell');
    expect(errors[2]!.message).toContain(`outside 0 to ${max}`);
  });

  it('refuses a half-life column in a unit other than s, naming the header', () => {
    const errors = errorsOf('pathway,label,kind,G [kJ/mol],half-life [min],half-life sigma [h]\nA,TS,ts,,5,1\n');
    expect(errors).toEqual([
      { row: 1, column: 'half-life [min]', value: 'half-life [min]', message: 'unknown time unit "min"; half-life is read in s, e.g. "half-life [s]"' },
      { row: 1, column: 'half-life sigma [h]', value: 'half-life sigma [h]', message: 'unknown time unit "h"; half-life sigma is read in s, e.g. "half-life sigma [s]"' },
    ]);
  });

  it('refuses a σ without its value, a k and an energy on one row, a k on a minimum and an energy σ on a rate row', () => {
    const errors = errorsOf('pathway,label,kind,G [kJ/mol],sigma,k,k sigma,half-life [s]\nA,R,min,0,,,5,\nA,TS1,ts,80,,1e3,,\nA,I,min,,,1e3,,\nA,TS2,ts,,2,1e3,,\nA,TS3,ts,,,1e3,,60\n');
    expect(errors.map((e) => [e.row, e.column])).toEqual([[2, 'k sigma'], [3, 'G [kJ/mol]'], [4, 'kind'], [5, 'sigma'], [6, 'half-life [s]']]);
  });

  it('refuses k outside BOUNDS.rateConstant and a molecularity other than 1–3', () => {
    const tooLarge = BOUNDS.rateConstant.hard[1] * 10;
    const errors = errorsOf(`pathway,label,kind,G [kJ/mol],k,molecularity\nA,TS1,ts,,${tooLarge},\nA,TS2,ts,,1,4\n`);
    expect(errors.map((e) => [e.row, e.column])).toEqual([[2, 'k'], [3, 'molecularity']]);
    expect(errors[0]!.message).toContain('rate constant');
  });

  it('checks an energy σ against BOUNDS.uncertaintyKJ after converting its unit', () => {
    // 1 kcal = 4.184 kJ exactly (thermochemical calorie, NIST SP 811).
    const overKcal = (BOUNDS.uncertaintyKJ.hard[1] / 4.184) * 1.01;
    const errors = errorsOf(`pathway,label,kind,G [kcal/mol],sigma\nA,R,min,0,${overKcal}\n`);
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatchObject({ row: 2, column: 'sigma' });
    expect(errors[0]!.message).toContain('kJ/mol');
  });
});
