import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { speciesNetwork } from '../../../core/analysis/speciesNetwork.ts';
import { simulate } from '../../../core/kinetics/microkinetics/simulate.ts';
import { makeDocument } from '../../../core/model/load.ts';

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
