import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { speciesNetwork } from '../../../core/analysis/speciesNetwork.ts';
import { simulate } from '../../../core/kinetics/microkinetics/simulate.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { speciesProgress } from '../../../core/analysis/speciesProgress.ts';

const terms = (...ids: string[]) => ids.map((species) => ({ species, count: 1 }));
const point = (id: string, kind: 'min' | 'ts', value: number, composition: string[]) => ({ id, label: id, kind, energy: { mode: 'value' as const, value, unit: 'kcal/mol' as const }, composition: terms(...composition) });

describe('speciesNetwork', () => {
  const doc = makeDocument({
    species: [{ id: 'A', label: 'A' }, { id: 'B', label: 'B' }, { id: 'AB', label: 'AB' }, { id: 'TS', label: 'TS' }],
    pathways: [{ id: 'p', name: 'Association', points: [point('A + B', 'min', 0, ['A', 'B']), point('TS', 'ts', 15, ['TS']), point('AB', 'min', -2, ['AB'])] }],
  });

  it('turns A + B → [TS] → AB into a second-order elementary reaction with Eyring constants', () => {
    const { network, findings } = speciesNetwork(doc, analyseDocument(doc));
    expect(findings).toEqual([]);
    expect(network!.reactions).toHaveLength(1);
    expect(network!.reactions[0]!.reactants.map((r) => r.species).sort()).toEqual(['A', 'B']);
    // Eyring at 15 kcal/mol, 298.15 K, c° = 1 mol/L: 62.8327064952 (REFERENCE.md §2), here in L mol⁻¹ s⁻¹.
    expect(Math.abs(network!.reactions[0]!.kf / 62.8327064952 - 1)).toBeLessThan(1e-9);
  });

  it('reaches the equilibrium detailed balance predicts: K = exp(2.0 kcal/mol / RT) = 29.24220877 L/mol', () => {
    // REFERENCE.md §8 forward check: exp(2.0/RT) at 298.15 K = 29.24220877.
    const { network } = speciesNetwork(doc, analyseDocument(doc));
    const run = simulate(network!, { A: 0.1, B: 0.1 }, { until: 10, points: 10 });
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const last = run.simulation.concentrations.at(-1)!;
    const [a, b, ab] = ['A', 'B', 'AB'].map((s) => last[run.simulation.species.indexOf(s)]!);
    expect(Math.abs(ab! / (a! * b!) / 29.24220877 - 1)).toBeLessThan(1e-6);
    expect(a! + ab!).toBeCloseTo(0.1, 12); // A is conserved
  });

  it('leaves out pathways whose minima have no compositions, saying so', () => {
    const typedOnly = makeDocument({ pathways: [{ id: 'q', name: 'Typed', points: [{ id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } }] }] });
    const { network, findings } = speciesNetwork(typedOnly, analyseDocument(typedOnly));
    expect(network).toBeNull();
    expect(findings.map((f) => f.code)).toEqual(['network-needs-compositions', 'network-empty']);
  });
});

describe('species-mode progress: substrate conversion, product yield, turnover number', () => {
  const pointOf = (id: string, kind: 'min' | 'ts', value: number, composition: [string, number][]) =>
    ({ id, label: id, kind, energy: { mode: 'value' as const, value, unit: 'kcal/mol' as const }, composition: composition.map(([species, count]) => ({ species, count })) });
  const run = (doc: ReturnType<typeof makeDocument>, initial: Record<string, number>, until: number) => {
    const built = speciesNetwork(doc, analyseDocument(doc));
    const sim = simulate(built.network!, initial, { until, points: 30, logTime: false });
    if (!sim.ok) throw new Error(JSON.stringify(sim.errors));
    const series = Object.fromEntries(speciesProgress(sim.simulation, built.roles!).map((p) => [p.name, p.values]));
    return { built, sim: sim.simulation, series };
  };

  it('A ⇌ P matches the analytic solution of reversible first-order kinetics, x(t) = K/(1+K)·(1 − exp(−(kf + kr)t))', () => {
    const doc = makeDocument({
      species: ['A', 'TS', 'P'].map((id) => ({ id, label: id })),
      pathways: [{ id: 'p', name: 'Isomerisation', points: [pointOf('A', 'min', 0, [['A', 1]]), pointOf('TS', 'ts', 20, [['TS', 1]]), pointOf('P', 'min', -1, [['P', 1]])] }],
    });
    const step = analyseDocument(doc).pathways[0]!.steps[0]!;
    // Eyring by hand with CODATA 2018 k_B, h, R at 298.15 K: kf = (k_BT/h)·exp(−20 kcal/mol / RT).
    const kT = (1.380649e-23 * 298.15) / 6.62607015e-34, RT = 8.314462618 * 298.15;
    expect(Math.abs(step.kForward! / (kT * Math.exp(-20 * 4184 / RT)) - 1)).toBeLessThan(1e-9);
    const kf = step.kForward!, kr = step.kReverse!, K = kf / kr;
    const { built, sim, series } = run(doc, { A: 0.5 }, 3 / kf);
    expect(built.roles).toEqual({ substrates: { A: 1 }, products: { P: 1 }, catalyst: [] });
    expect(Object.keys(series)).toEqual(['conversion of A', 'yield of P']);
    sim.times.forEach((t, k) => {
      const exact = (K / (1 + K)) * (1 - Math.exp(-(kf + kr) * t));
      expect(Math.abs(series['conversion of A']![k]! - exact)).toBeLessThan(1e-6);
      expect(Math.abs(series['yield of P']![k]! - exact)).toBeLessThan(1e-6);
    });
  });

  it('A → 2 P: the yield counts the stoichiometry, [P]/(2[A]₀) = 1 − exp(−kt) (analytic solution of first-order kinetics)', () => {
    const doc = makeDocument({
      species: ['A', 'TS', 'P'].map((id) => ({ id, label: id })),
      pathways: [{ id: 'p', name: 'Split', points: [pointOf('A', 'min', 0, [['A', 1]]), pointOf('TS', 'ts', 20, [['TS', 1]]), pointOf('2 P', 'min', -25, [['P', 2]])] }],
    });
    const { built, sim, series } = run(doc, { A: 0.2 }, 2e2);
    const k = built.network!.reactions[0]!.kf;
    expect(built.roles!.products).toEqual({ P: 2 });
    sim.times.forEach((t, i) => {
      expect(Math.abs(series['conversion of A']![i]! - (1 - Math.exp(-k * t)))).toBeLessThan(1e-6);
      expect(Math.abs(series['yield of P']![i]! - (1 - Math.exp(-k * t)))).toBeLessThan(1e-6);
    });
  });

  it('cat + S → cat·S → cat + P: the catalyst is what the cycle regenerates; TON = Δ[P]/[cat]₀ reaches [S]₀/[cat]₀ = 100', () => {
    const doc = makeDocument({
      species: ['cat', 'S', 'catS', 'TS1', 'TS2', 'P'].map((id) => ({ id, label: id })),
      pathways: [{ id: 'c', name: 'Cycle', cycle: true, points: [
        pointOf('cat + S', 'min', 0, [['cat', 1], ['S', 1]]), pointOf('TS1', 'ts', 10, [['TS1', 1]]), pointOf('cat·S', 'min', -2, [['catS', 1]]),
        pointOf('TS2', 'ts', 15, [['TS2', 1]]), pointOf('cat + P', 'min', -20, [['cat', 1], ['P', 1]]),
      ] }],
    });
    const { built, sim, series } = run(doc, { cat: 0.01, S: 1 }, 1e4);
    expect(built.roles).toEqual({ substrates: { S: 1 }, products: { P: 1 }, catalyst: ['cat'] });
    expect(Object.keys(series)).toEqual(['conversion of S', 'yield of P', 'TON of P']);
    // By hand: TON = [P]/[cat]₀ = yield·[S]₀/[cat]₀ at every time; full conversion gives 1 mol/L / 0.01 mol/L = 100.
    series['TON of P']!.forEach((ton, i) => expect(ton).toBeCloseTo(series['yield of P']![i]! * 100, 9));
    expect(series['TON of P']!.at(-1)!).toBeCloseTo(100, 4);
    expect(series['conversion of S']!.at(-1)!).toBeCloseTo(1, 6);
    // The old single column was the catalyst's: 1 − [cat]/[cat]₀, near 0 once the cycle has run out of substrate.
    expect(sim.conversion.at(-1)!).toBeLessThan(0.01);
  });
});
