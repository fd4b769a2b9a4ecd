import { describe, expect, it } from 'vitest';
import { analyseSteps, splitSteps } from '../../../core/kinetics/index.ts';
import { cycle, kcal, pathway, rel } from './build.ts';

const T = 298.15;
const KBT_H = 6.212437991620116e12; // REFERENCE.md §1/§2, k_BT/h at 298.15 K (CODATA 2018, exact)

describe('splitSteps', () => {
  it('splits minimum → TS → minimum and makes two minima a barrierless step', () => {
    const { steps, findings } = splitSteps(pathway([['A', 'min', 0], ['TS1', 'ts', 10], ['B', 'min', -2], ['C', 'min', 3]]));
    expect(findings).toEqual([]);
    expect(steps.map((s) => [s.from.id, s.ts?.id ?? null, s.to.id])).toEqual([['A', 'TS1', 'B'], ['B', null, 'C']]);
  });

  it('reports consecutive TSs and a leading or trailing TS instead of throwing', () => {
    const { steps, findings } = splitSteps(pathway([['X', 'ts', 5], ['A', 'min', 0], ['T1', 'ts', 9], ['T2', 'ts', 8], ['B', 'min', 1], ['T3', 'ts', 4], ['C', 'min', 0], ['T4', 'ts', 6]]));
    expect(findings.map((f) => [f.code, f.point])).toEqual([['starts-with-ts', 'X'], ['consecutive-ts', 'T2'], ['ends-with-ts', 'T4']]);
    expect(findings.every((f) => f.severity === 'error' && f.pathway === 'p')).toBe(true);
    expect(findings[1]?.message).toContain('"T1" and TS "T2"');
    expect(steps.map((s) => s.ts?.id)).toEqual(['T3']);
  });
});

describe('analyseSteps', () => {
  it('reproduces the Eyring k⁺ and k⁻ of cycle A', () => {
    // REFERENCE.md §6, Kozuch & Shaik ACR 2011 convention, cycle A: Eyring k⁺ / k⁻ lists (κ = 1, 298.15 K).
    const kPlus = [9.9357585046e3, 2.5127845163e-3, 2.5127845163e-3, 5.3728672921e4];
    const kMinus = [3.9734752044e-1, 3.1598238827e-2, 3.1598238827e-2, 2.9054352444e5];
    const { steps, findings } = analyseSteps(cycle([0, 12, -6, 15, -4.5, 16.5, -3, 8, -2]), { temperatureK: T });
    expect(findings).toEqual([]);
    steps.forEach((s, i) => {
      expect(rel(s.kForward!, kPlus[i]!)).toBeLessThan(1e-9);
      expect(rel(s.kReverse!, kMinus[i]!)).toBeLessThan(1e-9);
    });
  });

  it('reproduces the Eyring k⁺ and k⁻ of cycle B', () => {
    // REFERENCE.md §6, Kozuch & Shaik ACR 2011 convention, cycle B: Eyring k⁺ / k⁻ lists.
    const kPlus = [1.3588150048e-2, 6.2832706495e1, 4.5943752146e7, 3.3977455616e2];
    const kMinus = [1.1619319145e1, 3.4364858033e-9, 6.2832706495e1, 9.9357585046e3];
    const { steps } = analyseSteps(cycle([0, 20, 4, 19, -10, -3, -18, -4, -16]), { temperatureK: T });
    steps.forEach((s, i) => {
      expect(rel(s.kForward!, kPlus[i]!)).toBeLessThan(1e-9);
      expect(rel(s.kReverse!, kMinus[i]!)).toBeLessThan(1e-9);
    });
  });

  it('holds detailed balance kF/kR = K and reports barriers, energies and half-life', () => {
    // REFERENCE.md §2: ΔG‡ = 15 kcal/mol → k = 62.8327064952 s⁻¹, t½ = 0.0110316301688 s.
    const [s] = analyseSteps(pathway([['A', 'min', 0], ['TS', 'ts', 15], ['B', 'min', -5]]), { temperatureK: T }).steps;
    expect(s?.barrierForwardJ).toBe(kcal(15));
    expect(s?.barrierReverseJ).toBe(kcal(20));
    expect(s?.reactionEnergyJ).toBe(kcal(-5));
    expect(rel(s!.kForward!, 62.8327064952)).toBeLessThan(1e-9);
    expect(rel(s!.halfLifeSeconds!, 0.0110316301688)).toBeLessThan(1e-9);
    // REFERENCE.md §2: ΔG‡ = 20 kcal/mol → 0.0135881500479 s⁻¹ (the reverse runs over the same TS).
    expect(rel(s!.kReverse!, 0.0135881500479)).toBeLessThan(1e-9);
    expect(rel(s!.kForward! / s!.kReverse!, s!.equilibriumConstant!)).toBeLessThan(1e-12);
    expect(s?.negativeBarrier).toBe(false);
  });

  it('gives a barrierless step max(0, ΔE) both ways', () => {
    const { steps } = analyseSteps(pathway([['A', 'min', 0], ['B', 'min', 15], ['C', 'min', 10]]), { temperatureK: T });
    expect(steps.map((s) => [s.barrierless, s.barrierForwardJ, s.barrierReverseJ])).toEqual([[true, kcal(15), 0], [true, 0, kcal(5)]]);
    // REFERENCE.md §2: uphill 15 kcal/mol → 62.8327064952 s⁻¹; downhill runs at k_BT/h.
    expect(rel(steps[0]!.kForward!, 62.8327064952)).toBeLessThan(1e-9);
    expect(rel(steps[1]!.kForward!, KBT_H)).toBeLessThan(1e-12);
  });

  it('flags a TS below a neighbour and never exceeds κ k_BT/h', () => {
    // REFERENCE.md §10 (common practice): a TS below its minimum must be flagged, not turned into k > k_BT/h.
    const { steps, findings } = analyseSteps(pathway([['A', 'min', 0], ['TS', 'ts', -1], ['B', 'min', -10]]), { temperatureK: T, transmission: 0.5 });
    const s = steps[0]!;
    expect(s.negativeBarrier).toBe(true);
    expect(s.barrierForwardJ).toBe(kcal(-1));
    expect(s.kForward).toBeLessThanOrEqual(0.5 * KBT_H * (1 + 1e-12));
    expect(rel(s.kForward! / s.kReverse!, s.equilibriumConstant!)).toBeLessThan(1e-12);
    expect(findings.map((f) => f.code)).toEqual(['ts-below-neighbour']);
    expect(findings[0]?.message).toContain('"TS" lies 4.18 kJ/mol below "A"');
  });

  it('reports steps with unknown energies as nulls with a finding', () => {
    const { steps, findings } = analyseSteps(pathway([['A', 'min', 0], ['TS', 'ts', null], ['B', 'min', 1]]), { temperatureK: T });
    expect(steps[0]?.kForward).toBeNull();
    expect(steps[0]?.barrierForwardJ).toBeNull();
    expect(findings.map((f) => f.code)).toEqual(['step-energy-missing']);
  });

  it('uses per-step molecularity for units and rejects other values', () => {
    const path = pathway([['A', 'min', 0], ['TS1', 'ts', 20], ['B', 'min', -3], ['TS2', 'ts', 10], ['C', 'min', -4]]);
    const { steps, findings } = analyseSteps(path, { temperatureK: T, molecularity: { TS1: { forward: 2, reverse: 1 }, TS2: 4 } });
    expect([steps[0]?.unitForward, steps[0]?.unitReverse]).toEqual(['M⁻¹ s⁻¹', 's⁻¹']);
    expect(steps[1]?.molecularityForward).toBe(1);
    expect(findings.map((f) => [f.code, f.point])).toEqual([['bad-molecularity', 'TS2']]);
    // REFERENCE.md §2 molecularity check: m = 2 at 20 kcal/mol → 0.0135881500479 M⁻¹ s⁻¹.
    expect(rel(steps[0]!.kForward!, 0.0135881500479)).toBeLessThan(1e-9);
  });

  it('rejects a bad temperature or transmission with findings', () => {
    const path = pathway([['A', 'min', 0], ['TS', 'ts', 10], ['B', 'min', 0]]);
    expect(analyseSteps(path, { temperatureK: -5 }).findings.map((f) => f.code)).toEqual(['bad-temperature']);
    expect(analyseSteps(path, { temperatureK: T, transmission: 0 }).findings.map((f) => f.code)).toEqual(['bad-transmission']);
  });
});
