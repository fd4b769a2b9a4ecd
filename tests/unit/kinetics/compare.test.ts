import { describe, expect, it } from 'vitest';
import { compareBarriers, competingPathways, CURTIN_HAMMETT_ASSUMPTION } from '../../../core/kinetics/index.ts';
import { kcal, pathway, rel } from './build.ts';

const T = 298.15;

describe('compareBarriers', () => {
  it('turns ΔΔG‡ of the effective barriers into a rate ratio', () => {
    // REFERENCE.md §2 (Eyring): 25 → 20 kcal/mol is 0.0135881500479 / 2.93856228742e-6 = 4624.1 faster.
    const uncatalysed = pathway([['S', 'min', 0], ['TS', 'ts', 25], ['P', 'min', -10]], { id: 'un' });
    const catalysed = pathway([['S', 'min', 0], ['TSa', 'ts', 12], ['I', 'min', -3], ['TSb', 'ts', 17], ['P', 'min', -10]], { id: 'cat' });
    const { comparison, findings } = compareBarriers(uncatalysed, catalysed, T);
    expect(findings).toEqual([]);
    expect(comparison!.ddgJ).toBe(kcal(5));
    expect(rel(comparison!.rateRatio, 0.0135881500479 / 2.93856228742e-6)).toBeLessThan(1e-9);
    expect(comparison!.candidate.ts.id).toBe('TSb');
    // REFERENCE.md §1: RT ln 10 = 1.36424701303424 kcal/mol per decade.
    expect(comparison!.log10RateRatio).toBeCloseTo(5 / 1.36424701303424, 9);
  });

  it('reports instead of comparing when a barrier is unknown', () => {
    const a = pathway([['S', 'min', 0], ['TS', 'ts', null], ['P', 'min', -1]], { id: 'a' });
    const b = pathway([['S', 'min', 0], ['TS', 'ts', 10], ['P', 'min', -1]], { id: 'b' });
    const r = compareBarriers(a, b, T);
    expect(r.comparison).toBeNull();
    expect(r.findings.map((f) => [f.code, f.pathway])).toEqual([['energy-missing', 'a']]);
  });
});

describe('competingPathways', () => {
  it('uses the highest TS of each pathway on the common reference', () => {
    // REFERENCE.md §8 forward check: ΔΔG‡ = 1.0 kcal/mol → 84.39354867 % major, ee 68.78709734 %.
    const a = pathway([['R', 'min', 0], ['TSa1', 'ts', 8], ['Ia', 'min', -2], ['TSa2', 'ts', 14], ['Pa', 'min', -9]], { id: 'a' });
    const b = pathway([['R', 'min', 0], ['TSb1', 'ts', 15], ['Pb', 'min', -12]], { id: 'b' });
    const { result, findings } = competingPathways([a, b], T);
    expect(findings).toEqual([]);
    expect(result!.assumption).toBe(CURTIN_HAMMETT_ASSUMPTION);
    expect(rel(result!.channels[0]!.percent, 84.39354867)).toBeLessThan(1e-9);
    expect(rel(result!.pair!.ee, 0.6878709734)).toBeLessThan(1e-9);
    expect(rel(result!.pair!.ratio, 5.407606565)).toBeLessThan(1e-9);
  });

  it('Boltzmann-sums the TSs it is told to', () => {
    // REFERENCE.md §8: TS_A = {15.0, 15.4}, TS_B = {16.2, 16.5} → A:B = 7.13626841781; lowest-only 7.57889872931.
    const a = pathway([['R', 'min', 0], ['TSa', 'ts', 15], ['TSa′', 'ts', 15.4], ['Pa', 'min', -5]], { id: 'a' });
    const b = pathway([['R', 'min', 0], ['TSb', 'ts', 16.2], ['TSb′', 'ts', 16.5], ['Pb', 'min', -5]], { id: 'b' });
    const ensemble = competingPathways([a, b], T, { a: ['TSa', 'TSa′'], b: ['TSb', 'TSb′'] });
    expect(rel(ensemble.result!.pair!.ratio, 7.13626841781)).toBeLessThan(1e-9);
    const lowestOnly = competingPathways([a, b], T, { a: ['TSa'], b: ['TSb'] });
    expect(rel(lowestOnly.result!.pair!.ratio, 7.57889872931)).toBeLessThan(1e-9);
  });

  it('names unknown TS ids and leaves out pathways it cannot use', () => {
    const a = pathway([['R', 'min', 0], ['TSa', 'ts', 15], ['Pa', 'min', -5]], { id: 'a' });
    const b = pathway([['R', 'min', 0], ['Pb', 'min', -5]], { id: 'b' });
    const c = pathway([['R', 'min', 0], ['TSc', 'ts', null], ['Pc', 'min', -5]], { id: 'c' });
    const r = competingPathways([a, b, c], T, { a: ['TSa', 'nope'] });
    expect(r.findings.map((f) => [f.code, f.pathway, f.point])).toEqual([['unknown-ts', 'a', 'nope'], ['no-ts', 'b', undefined], ['energy-missing', 'c', 'TSc']]);
    expect(r.result!.channels.map((ch) => ch.id)).toEqual(['a']);
    expect(r.result!.pair).toBeNull();
  });
});

describe('competingPathways reads TS energies through the raise rule', () => {
  it('a TS below its product counts at the product energy (Curtin–Hammett on the energies k uses)', async () => {
    const { competingPathways } = await import('../../../core/kinetics/compare.ts');
    const { pathway: build, kcal: kc } = await import('./build.ts');
    const a = build([['R', 'min', 0], ['TSa', 'ts', 10], ['Pa', 'min', 11]], { id: 'a' });
    const b = build([['R', 'min', 0], ['TSb', 'ts', 10.5], ['Pb', 'min', -5]], { id: 'b' });
    const { result } = competingPathways([a, b], 298.15);
    // Expected from REFERENCE.md §8 ratio = exp(ΔΔG‡/RT) with ΔΔG‡ = 10.5 − 11.0 = −0.5 kcal/mol.
    const ratio = Math.exp(kc(-0.5) / (8.31446261815324 * 298.15));
    expect(result!.channels[0]!.fraction / result!.channels[1]!.fraction).toBeCloseTo(ratio, 10);
  });
});
