import { describe, expect, it } from 'vitest';
import { G_FROM_H_S, HELD_G, temperatureScan } from '../../../core/kinetics/index.ts';
import { cycle, kcal, pathway, rel } from './build.ts';

describe('temperatureScan', () => {
  it('holds G and changes only k_BT/h and RT by default', () => {
    // REFERENCE.md §2: k_BT/h = 5.69152251354e12 (273.15 K) and 7.77518442587e12 s⁻¹ (373.15 K); a downhill barrierless step runs at k_BT/h.
    const p = pathway([['A', 'min', 0], ['B', 'min', -5]]);
    const scan = temperatureScan({ pathways: [p], range: { startK: 273.15, endK: 373.15, count: 3 } });
    expect(scan.temperaturesK).toEqual([273.15, 323.15, 373.15]);
    expect(scan.pathways[0]?.approximation).toBe(HELD_G);
    const k = scan.pathways[0]!.steps[0]!.kForward;
    expect(rel(k[0]!, 5.69152251354e12)).toBeLessThan(1e-10);
    expect(rel(k[2]!, 7.77518442587e12)).toBeLessThan(1e-10);
    expect(scan.pathways[0]?.tof).toBeNull();
  });

  it('gives the TOF of a cycle at each temperature', () => {
    // REFERENCE.md §6 cycle A (Kozuch & Shaik ACR 2011): TOF = 1.66434592407551e-4 s⁻¹ at 298.15 K.
    const scan = temperatureScan({ pathways: [cycle([0, 12, -6, 15, -4.5, 16.5, -3, 8, -2])], range: { startK: 298.15, endK: 398.15, count: 2 } });
    const tof = scan.pathways[0]!.tof!;
    expect(rel(tof[0]!, 1.66434592407551e-4)).toBeLessThan(1e-9);
    expect(tof[1]!).toBeGreaterThan(tof[0]!);
  });

  it('uses G(T) = H − T·S when ΔH and ΔS are given for every point', () => {
    // REFERENCE.md §9 (van 't Hoff, NIST-JANAF R2): ΔrH° = −91.796 kJ/mol, ΔrS° = −198.101 J/(mol K) → K(298.15) = 542539.092802, K(400) = 43.6074912142.
    const p = pathway([['N2 + 3H2', 'min', 0], ['TS', 'ts', 0], ['2NH3', 'min', 0]]);
    const thermo = { p: { 'N2 + 3H2': { hJ: 0, sJPerK: 0 }, TS: { hJ: 150000, sJPerK: -120 }, '2NH3': { hJ: -91796, sJPerK: -198.101 } } };
    const scan = temperatureScan({ pathways: [p], range: { startK: 298.15, endK: 400, count: 2 }, thermo });
    expect(scan.findings).toEqual([]);
    expect(scan.pathways[0]?.approximation).toBe(G_FROM_H_S);
    const step = scan.pathways[0]!.steps[0]!;
    expect(rel(step.equilibriumConstant[0]!, 542539.092802)).toBeLessThan(1e-9);
    expect(rel(step.equilibriumConstant[1]!, 43.6074912142)).toBeLessThan(1e-9);
    // REFERENCE.md §2 thermodynamic form k = (k_BT/h) e^(ΔS‡/R) e^(−ΔH‡/RT); k_BT/h(298.15 K) = 6.212437991620116e12, R exact (§1).
    const R = 8.31446261815324;
    expect(rel(step.kForward[0]!, 6.212437991620116e12 * Math.exp(-120 / R) * Math.exp(-150000 / (R * 298.15)))).toBeLessThan(1e-12);
  });

  it('falls back to held G, with a finding, when ΔH/ΔS are incomplete', () => {
    const p = pathway([['A', 'min', 0], ['TS', 'ts', 20], ['B', 'min', -2]]);
    const scan = temperatureScan({ pathways: [p], range: { startK: 298.15, endK: 310, count: 4 }, thermo: { p: { A: { hJ: 0, sJPerK: 0 } } } });
    expect(scan.findings.map((f) => [f.code, f.point])).toEqual([['thermo-incomplete', 'TS']]);
    expect(scan.pathways[0]?.approximation).toBe(HELD_G);
    // REFERENCE.md §2: 20 kcal/mol at 298.15 K → 0.0135881500479 s⁻¹.
    expect(rel(scan.pathways[0]!.steps[0]!.kForward[0]!, 0.0135881500479)).toBeLessThan(1e-9);
  });

  it('scans the Curtin–Hammett product share', () => {
    // REFERENCE.md §8 other temperatures: 95:5 ↔ 1.141862008 kcal/mol at 195.15 K.
    const a = pathway([['R', 'min', 0], ['TSa', 'ts', 10], ['Pa', 'min', -5]], { id: 'a' });
    const b = pathway([['R', 'min', 0], ['TSb', 'ts', 10 + 1.141862008], ['Pb', 'min', -5]], { id: 'b' });
    const scan = temperatureScan({ pathways: [a, b], range: { startK: 195.15, endK: 353.15, count: 3 }, selectivity: { pathways: ['a', 'b'] } });
    const share = scan.selectivity!;
    expect(share.map((s) => s.id)).toEqual(['a', 'b']);
    expect(share[0]!.percent[0]!).toBeCloseTo(95, 7);
    expect(share[0]!.percent[2]!).toBeLessThan(share[0]!.percent[0]!);
  });

  it('reports a bad range or selectivity request', () => {
    const p = pathway([['A', 'min', 0], ['TS', 'ts', 20], ['B', 'min', -2]]);
    expect(temperatureScan({ pathways: [p], range: { startK: 0, endK: 300, count: 3 } }).findings.map((f) => f.code)).toEqual(['bad-temperature']);
    expect(temperatureScan({ pathways: [p], range: { startK: 280, endK: 300, count: 2.5 } }).findings.map((f) => f.code)).toEqual(['bad-scan-count']);
    const bad = temperatureScan({ pathways: [p], range: { startK: 280, endK: 300, count: 2 }, selectivity: { pathways: ['p', 'zz'] } });
    expect(bad.findings.map((f) => f.code)).toEqual(['bad-selectivity']);
    expect(bad.selectivity).toBeNull();
  });
});
