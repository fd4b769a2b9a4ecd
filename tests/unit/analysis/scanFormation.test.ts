import { describe, expect, it } from 'vitest';
import { scanDocument } from '../../../core/analysis/scanDocument.ts';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { thermoReport } from '../../../core/thermo/thermoReport.ts';
import { vantHoffK } from '../../../core/thermo/equilibrium.ts';
import { onePathway } from '../profile/builders.ts';
import { JANAF_CSV as table } from '../thermo/helpers.ts';

// NIST-JANAF (Chase 1998; tables N-023, H-050, H-083) 298.15 K, 1 bar: ΔfH° kJ/mol, S° J/(mol K), ΔfG° kJ/mol.
const JANAF = { N2: [0, 191.609, 0], H2: [0, 130.68, 0], NH3: [-45.898, 192.774, -16.367] } as const;
const species = Object.entries(JANAF).map(([id, [dfH, S, dfG]]) => ({ id, label: id, formula: id, phase: 'gas' as const, formation: { dfH, S, dfG } }));
const ammonia = onePathway([
  { id: 'R', label: 'N2 + 3 H2', kind: 'min', energy: { mode: 'formation', terms: [{ species: 'N2', count: 1 }, { species: 'H2', count: 3 }] } },
  { id: 'P', label: '2 NH3', kind: 'min', energy: { mode: 'formation', terms: [{ species: 'NH3', count: 2 }] } },
], { species, settings: { quantity: 'G' } });

describe('temperature scan of formation-data states', () => {
  it('follows ΔrH° − TΔrS°: K(698 K) matches `thermo` and van \'t Hoff, not the held ΔfG° (≈ 281)', () => {
    const scan = scanDocument(ammonia, 298.15, 698, 2);
    const K = scan.series.find((s) => s.kind === 'K')!.values;
    const thermo = thermoReport(table, 'N2(g) + 3 H2(g) -> 2 NH3(g)', 698);
    if (!thermo.ok) throw new Error(thermo.message);
    // REFERENCE.md §9: ΔrH° = −91.796 kJ/mol, ΔrS° = −198.101 J/(mol K); K(298.15) = 542539.092802 from ΔH − TΔS.
    expect(Math.abs(K[0]! / 542539.092802 - 1)).toBeLessThan(1e-9);
    const vantHoff = vantHoffK(542539.092802, 298.15, 698, -91796);
    expect(Math.abs(K[1]! / vantHoff - 1)).toBeLessThan(1e-9);
    expect(Math.abs(K[1]! / thermo.result.K! - 1)).toBeLessThan(1e-12);
    expect(K[1]!).toBeGreaterThan(3.2e-4);
    expect(K[1]!).toBeLessThan(3.4e-4);
    expect(scan.approximations[0]).toContain('ΔfH° − T·S°');
  });

  it('states the route and the constant-ΔrH° approximation in the provenance', () => {
    const a = analyseDocument({ ...ammonia, settings: { ...ammonia.settings, temperatureK: 500 } });
    const p = a.profile.pathways[0]!.points[1]!;
    expect(p.provenance.detail).toContain('ΔfH° − T·S°');
    expect(p.provenance.approximations.join(' ')).toContain('ΔrCp = 0');
    // Table value at 500 K from REFERENCE.md §9: K(500) = 0.1746394704.
    expect(Math.abs(a.pathways[0]!.steps[0]!.equilibriumConstant! / 0.1746394704 - 1)).toBeLessThan(1e-8);
  });

  it('falls back to ΣΔfG° (held, with a warning) when S° is missing', () => {
    const noS = { ...ammonia, species: ammonia.species.map((s) => ({ ...s, formation: { dfG: s.formation!.dfG } })) };
    const a = analyseDocument({ ...noS, settings: { ...noS.settings, temperatureK: 500 } });
    expect(a.findings.some((f) => f.code === 'temperature-mismatch')).toBe(true);
    // ΣνΔfG° = −32.734 kJ/mol (REFERENCE.md §4 R2) used unchanged.
    expect(a.pathways[0]!.steps[0]!.reactionEnergyJ).toBeCloseTo(-32734, 6);
  });
});
