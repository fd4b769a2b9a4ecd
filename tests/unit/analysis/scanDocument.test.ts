import { describe, expect, it } from 'vitest';
import { scanDocument } from '../../../core/analysis/scanDocument.ts';
import { GAS_CONSTANT } from '../../../core/units/constants.ts';
import { kcalToHartree, onePathway, state, typed } from '../profile/builders.ts';
import { makeDocument } from '../../../core/model/load.ts';

describe('scanDocument', () => {
  it('holds typed G and changes k_BT/h and RT: k(273.15 K) for a 20 kcal/mol barrier', () => {
    const scan = scanDocument(onePathway([typed('R', 'min', 0), typed('T', 'ts', 20), typed('P', 'min', -5)]), 273.15, 373.15, 2);
    const k = scan.series.find((s) => s.name === 'k A: R → P')!;
    // k_BT/h at 273.15 K = 5.69152251354e12 s⁻¹ (REFERENCE.md §2, exact constants).
    const expected = 5.69152251354e12 * Math.exp(-83680 / (GAS_CONSTANT * 273.15));
    expect(Math.abs(k.values[0]! / expected - 1)).toBeLessThan(1e-10);
    expect(k.unit).toBe('s⁻¹');
    expect(scan.approximations[0]).toContain('G values held');
  });

  it('re-resolves species states at each temperature, so the entropy term follows T', () => {
    const sp = (id: string, e: number, h: number, g: number) => ({ id, label: id, structures: [{ electronic: kcalToHartree(e), hCorrection: kcalToHartree(h), gCorrection: kcalToHartree(g) }] });
    // TS with T·S term 2.9815 kcal/mol lower than the minima at 298.15 K: Δ‡S = −10 cal/(mol K), Δ‡H = 18 kcal/mol.
    const doc = onePathway([state('R', 'min', [['R', 1]]), state('T', 'ts', [['T', 1]]), state('P', 'min', [['P', 1]])], {
      species: [sp('R', 0, 0, 0), sp('T', 18, 0, 2.9815), sp('P', -5, 0, 0)],
    });
    const scan = scanDocument(doc, 298.15, 398.15, 2);
    const k = scan.series.find((s) => s.name === 'k A: R → P')!;
    // Δ‡G(T) = 18 + T·0.01 kcal/mol; Eyring k = (k_BT/h) exp(−Δ‡G/RT) (REFERENCE.md §3 synthetic set: 20.9815 at 298.15 K gives 0.00259248254739523 s⁻¹).
    expect(Math.abs(k.values[0]! / 0.00259248254739523 - 1)).toBeLessThan(1e-9);
    expect(scan.approximations[0]).toContain('re-resolved at each T');
  });
});

describe('scanDocument series', () => {
  it('say what they hold and which pathway they belong to', () => {
    const scan = scanDocument(onePathway([typed('R', 'min', 0), typed('T', 'ts', 20), typed('P', 'min', -5)]), 273.15, 373.15, 3);
    expect(scan.series.map(({ values: _v, ...about }) => about)).toEqual([
      { name: 'k A: R → P', kind: 'k', pathway: 'a', label: 'R → P', unit: 's⁻¹' },
      { name: 'K A: R → P', kind: 'K', pathway: 'a', label: 'R → P', unit: '1' },
    ]);
    // K = exp(−ΔG/RT) with ΔG = −5 kcal/mol = −20 920 J/mol (1 kcal = 4184 J, NIST SP 811).
    const K = scan.series[1]!;
    expect(Math.abs(K.values[0]! / Math.exp(20920 / (GAS_CONSTANT * 273.15)) - 1)).toBeLessThan(1e-10);
  });
});

describe('scanDocument product shares', () => {
  it('follow Curtin–Hammett at each temperature', () => {
    const route = (id: string, ts: number) => ({ id, name: id, points: [
      { id: `${id}-a`, label: 'A', kind: 'min' as const, energy: { mode: 'value' as const, value: 0, unit: 'kcal/mol' as const } },
      { id: `${id}-t`, label: `TS-${id}`, kind: 'ts' as const, energy: { mode: 'value' as const, value: ts, unit: 'kcal/mol' as const } },
      { id: `${id}-p`, label: `P-${id}`, kind: 'min' as const, energy: { mode: 'value' as const, value: -3, unit: 'kcal/mol' as const } },
    ] });
    const doc = makeDocument({ pathways: [route('x', 15), route('y', 16)], comparisons: [{ type: 'selectivity', pathways: ['x', 'y'], enantiomeric: false }] });
    const scan = scanDocument(doc, 250, 350, 2);
    const shares = scan.series.filter((s) => s.kind === 'share');
    expect(shares.map((s) => s.unit)).toEqual(['%', '%']);
    // Share of the lower TS = 1/(1 + exp(−ΔΔG‡/RT)), ΔΔG‡ = 1 kcal/mol = 4184 J/mol (Seeman,
    // Chem. Rev. 83, 83 (1983); R from CODATA 2018): 88.2 % at 250 K, 81.8 % at 350 K.
    const expected = (t: number) => 100 / (1 + Math.exp(-4184 / (GAS_CONSTANT * t)));
    expect(Math.max(...shares.map((s) => s.values[0]!))).toBeCloseTo(expected(250), 9);
    expect(Math.max(...shares.map((s) => s.values[1]!))).toBeCloseTo(expected(350), 9);
    expect(expected(250)).toBeCloseTo(88.2, 1);
  });
});
