import { describe, expect, it } from 'vitest';
import { effectiveBarrier } from '../../../core/kinetics/index.ts';
import { cycle, kcal, pathway } from './build.ts';

describe('effectiveBarrier', () => {
  // For a profile read once (no second turnover), the effective barrier is the largest
  // entry with i ≥ j of the span matrices in REFERENCE.md §6 (Kozuch & Shaik ACR 2011).
  it('finds T3 − I2 = 22.5 kcal/mol in cycle A read as a line', () => {
    const { result } = effectiveBarrier(cycle([0, 12, -6, 15, -4.5, 16.5, -3, 8, -2]));
    expect(result?.barrierJ).toBeCloseTo(kcal(22.5), 6);
    expect([result?.ts.id, result?.intermediate.id]).toEqual(['T3', 'I2']);
    expect(result?.reactionEnergyJ).toBe(kcal(-2));
    expect(result?.highest).toMatchObject({ id: 'T3', energyJ: kcal(16.5) });
  });

  it('finds T1 − I1 = 20.0 in cycle B read as a line, not the wrap-around span', () => {
    // REFERENCE.md §6 cycle B: largest entry with i ≥ j is T1/I1 = 20.0 (the 22.0 span needs the next turnover).
    const { result } = effectiveBarrier(cycle([0, 20, 4, 19, -10, -3, -18, -4, -16]));
    expect(result?.barrierJ).toBe(kcal(20));
    expect([result?.ts.id, result?.intermediate.id]).toEqual(['T1', 'I1']);
  });

  it('picks T2 − I2 = 20.0 in mini-cycle C although T1 is the highest TS', () => {
    // REFERENCE.md §6 mini-cycle C span matrix, i ≥ j entries: 14.0; 12.0, 20.0; −5.0, 3.0, 7.0.
    const { result } = effectiveBarrier(cycle([0, 14, -8, 12, -12, -5, -15]));
    expect(result?.barrierJ).toBe(kcal(20));
    expect([result?.ts.id, result?.intermediate.id, result?.highest.id]).toEqual(['T2', 'I2', 'T1']);
  });

  it('does not measure from a minimum that comes after the TS', () => {
    const { result } = effectiveBarrier(pathway([['A', 'min', 0], ['TS1', 'ts', 10], ['B', 'min', -30], ['TS2', 'ts', -25], ['C', 'min', -40]]));
    expect(result?.barrierJ).toBe(kcal(10));
  });

  it('counts an uphill pair of minima as a barrierless step', () => {
    const { result } = effectiveBarrier(pathway([['A', 'min', 0], ['TS1', 'ts', 5], ['B', 'min', -2], ['C', 'min', 8]]));
    expect(result).toMatchObject({ barrierJ: kcal(10), tsIsBarrierless: true, ts: { id: 'C' }, intermediate: { id: 'B' } });
  });

  it('gives a finding and no number when an energy is unknown or there is no step', () => {
    const unknown = effectiveBarrier(pathway([['A', 'min', 0], ['TS1', 'ts', null], ['B', 'min', 1]]));
    expect(unknown.result).toBeNull();
    expect(unknown.findings.map((f) => [f.code, f.point])).toEqual([['energy-missing', 'TS1']]);
    expect(effectiveBarrier(pathway([['A', 'min', 0]])).findings.map((f) => f.code)).toEqual(['no-barrier']);
  });
});

describe('effectiveBarrier uses the raised TS of the step rates', () => {
  // Independent reference: the step's own Eyring k (analyseSteps, which applies stepTopEnergy)
  // inverted with ΔG‡ = RT ln(κ k_BT / (h k)) (IUPAC Gold Book "Gibbs energy of activation").
  it('a TS below the following minimum is raised to it (11.4 → 12.2 kcal/mol)', async () => {
    const { analyseSteps } = await import('../../../core/kinetics/index.ts');
    const { kbtOverH, rtJoules } = await import('../../../core/units/index.ts');
    const p = pathway([['A', 'min', 0], ['TS', 'ts', 11.4], ['B', 'min', 12.2]]);
    const { result } = effectiveBarrier(p);
    const k = analyseSteps(p, { temperatureK: 298.15 }).steps[0]!.kForward!;
    const fromK = rtJoules(298.15) * Math.log(kbtOverH(298.15) / k);
    expect(result?.barrierJ).toBeCloseTo(fromK, 6);
    expect(result?.barrierJ).toBeCloseTo(kcal(12.2), 6);
    expect(result).toMatchObject({ tsRaised: true, ts: { id: 'TS' } });
  });

  it('a TS below the preceding minimum gives a zero barrier, never a negative one', () => {
    // Old code: −1.0 kcal/mol and a half-life shorter than h/k_BT.
    const { result } = effectiveBarrier(pathway([['A', 'min', 0], ['TS', 'ts', -1], ['B', 'min', -5]]));
    expect(result?.barrierJ).toBe(0);
    expect(result?.tsRaised).toBe(true);
  });
});
