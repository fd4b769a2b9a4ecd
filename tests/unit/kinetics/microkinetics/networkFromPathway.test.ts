import { describe, expect, it } from 'vitest';
import { networkFromPathway, stepRateConstants } from '../../../../core/kinetics/microkinetics/index.ts';
import { cycleA, cycleB, KCAL, pathway } from './pathwayBuilder.ts';

const T = 298.15;
// R = N_A·k_B, CODATA 2018 (exact).
const R = 8.314462618153241;

describe('networkFromPathway', () => {
  // REFERENCE.md §6 (Kozuch & Shaik ACR 2011), Eyring k⁺ and k⁻ of cycles A and B, 11 digits.
  it.each([
    ['A', cycleA, [9.9357585046e3, 2.5127845163e-3, 2.5127845163e-3, 5.3728672921e4], [3.9734752044e-1, 3.1598238827e-2, 3.1598238827e-2, 2.9054352444e5]],
    ['B', cycleB, [1.3588150048e-2, 6.2832706495e1, 4.5943752146e7, 3.3977455616e2], [1.1619319145e1, 3.4364858033e-9, 6.2832706495e1, 9.9357585046e3]],
  ] as const)('gives the sheet’s Eyring constants for cycle %s', (_name, path, kf, kr) => {
    const r = networkFromPathway(path, { temperatureK: T });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.network.species).toEqual(['I1', 'I2', 'I3', 'I4']);
    expect(r.network.turnoverReaction).toBe(3);
    expect(r.network.reactions[3]!.products[0]!.species).toBe('I1');
    r.network.reactions.forEach((reaction, i) => {
      expect(reaction.kf / kf[i]!).toBeCloseTo(1, 9);
      expect(reaction.kr / kr[i]!).toBeCloseTo(1, 9);
    });
  });

  // REFERENCE.md §2 (Eyring 1935): ΔG‡ = 20 kcal/mol at 298.15 K → k = 0.0135881500479 s⁻¹;
  // detailed balance: k_f/k_r = K = exp(−ΔG/RT).
  it('builds an open chain with Eyring forward and detailed-balance reverse constants', () => {
    const r = networkFromPathway(pathway([['R', 'min', 0], ['TS', 'ts', 20], ['P', 'min', -5]]), { temperatureK: T });
    if (!r.ok) throw new Error('expected a network');
    expect(r.network.turnoverReaction).toBeUndefined();
    const { kf, kr } = r.network.reactions[0]!;
    expect(kf / 0.0135881500479).toBeCloseTo(1, 10);
    expect(kf / kr / Math.exp((5 * KCAL) / (R * T))).toBeCloseTo(1, 10);
  });

  // REFERENCE.md §2: κ = 0.5 halves k (0.00679407502394 s⁻¹ at 20 kcal/mol).
  it('applies the transmission coefficient', () => {
    expect(stepRateConstants(20 * KCAL, 0, T, 0.5).kf / 0.00679407502394).toBeCloseTo(1, 10);
  });

  // Without a TS the step is taken as barrierless: barrier max(0, ΔG) (Passline's rule, common practice).
  it('treats a step without a TS as barrierless uphill or downhill', () => {
    const r = networkFromPathway(pathway([['A', 'min', 0], ['B', 'min', 3], ['C', 'min', -4]]), { temperatureK: T });
    if (!r.ok) throw new Error('expected a network');
    const [up, down] = r.network.reactions;
    expect(up!.kr / 6.212437991620116e12).toBeCloseTo(1, 12); // k_BT/h, REFERENCE.md §1–2
    expect(up!.kf / (6.212437991620116e12 * Math.exp((-3 * KCAL) / (R * T)))).toBeCloseTo(1, 12);
    expect(down!.kf / 6.212437991620116e12).toBeCloseTo(1, 12);
  });

  it('clamps a TS that lies below a minimum and warns at that TS', () => {
    const r = networkFromPathway(pathway([['A', 'min', 0], ['T', 'ts', 2], ['B', 'min', 5]]), { temperatureK: T });
    if (!r.ok) throw new Error('expected a network');
    expect(r.findings).toEqual([expect.objectContaining({ severity: 'warning', point: 'T', code: 'microkinetics-ts-below-minimum' })]);
    expect(r.network.reactions[0]!.kr / 6.212437991620116e12).toBeCloseTo(1, 12);
  });

  it.each([
    [pathway([['A', 'min', 0], ['T', 'ts', null], ['B', 'min', 1]]), 'T', /no energy/],
    [pathway([['T0', 'ts', 5], ['A', 'min', 0]]), 'T0', /starts with the transition state/],
    [pathway([['A', 'min', 0], ['T', 'ts', 5]]), 'T', /ends with the transition state/],
    [pathway([['A', 'min', 0], ['T1', 'ts', 5], ['T2', 'ts', 6], ['B', 'min', 1]]), 'T2', /two transition states in a row/],
  ] as const)('returns an error finding located at the bad point (%#)', (path, point, message) => {
    const r = networkFromPathway(path, { temperatureK: T });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]).toMatchObject({ severity: 'error', pathway: 'path', point });
    expect(r.errors[0]!.message).toMatch(message);
  });

  it('rejects a one-point pathway and a bad temperature', () => {
    expect(networkFromPathway(pathway([['A', 'min', 0]]), { temperatureK: T }).ok).toBe(false);
    const r = networkFromPathway(cycleA, { temperatureK: -4 });
    expect(!r.ok && r.errors[0]!.message).toMatch(/temperature/);
  });
});
