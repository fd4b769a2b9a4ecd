import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import type { Finding } from '../../../core/profile/types.ts';
import { onePathway, species, state, typed } from './builders.ts';

const findings = (doc: Parameters<typeof resolveProfile>[0], code: string): Finding[] => resolveProfile(doc).findings.filter((f) => f.code === code);

describe('consistency findings', () => {
  it('a TS below a neighbouring minimum is an error naming both and the gap', () => {
    const [f] = findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 5), typed('I', 'min', 7.5)]), 'ts-below-neighbour');
    expect(f).toEqual({ severity: 'error', code: 'ts-below-neighbour', pathway: 'a', point: 'T', message: 'transition state "T" lies 2.5 kcal mol⁻¹ below the neighbouring minimum "I" (negative barrier)' });
    expect(findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 5), typed('I', 'min', 4.9)]), 'ts-below-neighbour')).toEqual([]);
  });

  it('a zero barrier, a typed non-positive barrier and a TS without minima on both sides are flagged', () => {
    expect(findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 0), typed('P', 'min', -3)]), 'zero-barrier')).toHaveLength(1);
    const negative = onePathway([typed('R', 'min', 0), { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'barrier', value: -1, unit: 'kcal/mol' } }, typed('P', 'min', -3)]);
    expect(findings(negative, 'nonpositive-barrier')).toHaveLength(1);
    expect(findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 9)]), 'ts-without-minima')).toHaveLength(1);
  });

  it('a point whose energy cannot be resolved is reported as missing', () => {
    const doc = onePathway([{ id: 'T', label: 'T', kind: 'ts', energy: { mode: 'barrier', value: 5, unit: 'kcal/mol' } }, typed('P', 'min', 0)]);
    const profile = resolveProfile(doc);
    expect(profile.findings.map((f) => f.code)).toContain('no-previous-minimum');
    expect(profile.pathways[0]!.points[0]!.energyJ).toBeNull();
    const absent = onePathway([typed('R', 'min', 0), state('S', 'min', [['X', 1]])], { species: [species('X', -10)] });
    expect(resolveProfile(absent).findings.map((f) => f.code)).toEqual(['no-common-reference']);
  });

  it('a value given as another quantity than the profile\'s is flagged as mixed', () => {
    const doc = onePathway([typed('R', 'min', 0), { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'value', value: 20, unit: 'kcal/mol', quantity: 'E' } }, typed('P', 'min', -1)]);
    expect(findings(doc, 'mixed-quantities')[0]?.message).toBe('this value is given as E but the profile is in G; it is used as it is');
  });

  const atoms = [
    species('cat', -100, { formula: 'PdC2H6' }), species('ArBr', -200, { formula: 'C6H5Br' }),
    species('int', -305, { formula: 'PdC9H10Br' }), species('int+', -305, { formula: 'PdC8H11Br', charge: 1 }),
  ];
  it('mass balance: a state missing atoms is an error naming the element and the difference', () => {
    const doc = onePathway([state('cat + ArBr', 'min', [['cat', 1], ['ArBr', 1]]), state('int', 'min', [['int', 1]])], { species: atoms });
    expect(findings(doc, 'mass-imbalance')[0]?.message).toBe('"int" has 1 more C, 1 fewer H than the reference "cat + ArBr"');
    const balanced = onePathway([state('cat + ArBr', 'min', [['cat', 1], ['ArBr', 1]]), state('cat + ArBr again', 'min', [['ArBr', 1], ['cat', 1]])], { species: atoms });
    expect(resolveProfile(balanced).findings).toEqual([]);
  });

  it('charge balance is checked from the species charges', () => {
    const ok = species('int0', -305, { formula: 'PdC8H11Br' });
    const doc = onePathway([state('int0', 'min', [['int0', 1]]), state('int+', 'min', [['int+', 1]])], { species: [...atoms, ok] });
    expect(findings(doc, 'charge-imbalance')[0]?.message).toBe('"int+" has charge 1 higher than the reference "int0"');
  });

  it('a state shared by two pathways with different energies is flagged, when both share a reference', () => {
    const doc = (p: number) => makeDocument({ pathways: [
      { id: 'a', name: 'Ligand A', points: [typed('S', 'min', 0), typed('TS-a', 'ts', 18), typed('P', 'min', -7)] },
      { id: 'b', name: 'Ligand B', points: [typed('S', 'min', 0), typed('TS-b', 'ts', 15), typed('P', 'min', p)] },
    ] });
    expect(findings(doc(-6), 'shared-state-mismatch')[0]?.message).toBe('"P" has 2 different energies across pathways: -7.0 kcal mol⁻¹ in "Ligand A", -6.0 kcal mol⁻¹ in "Ligand B"');
    expect(findings(doc(-7), 'shared-state-mismatch')).toEqual([]);
  });

  it('a catalytic cycle must end at the regenerated first state', () => {
    const cycle = (last: ReturnType<typeof typed>) => onePathway([typed('Cat', 'min', 0), typed('T1', 'ts', 15), typed('I2', 'min', -2), typed('T2', 'ts', 10), last], {}, true);
    expect(findings(cycle(typed('Cat′', 'min', -5)), 'cycle-not-closed')).toEqual([]);
    expect(findings(cycle(typed('Other', 'min', -5)), 'cycle-not-closed')[0]?.severity).toBe('warning');
    expect(findings(cycle(typed('T3', 'ts', 4)), 'cycle-not-closed')[0]?.severity).toBe('error');
  });

  it('a thermal correction used at another temperature without an enthalpy is a warning', () => {
    const doc = onePathway([state('A', 'min', [['A', 1]]), state('B', 'min', [['B', 1]])], {
      settings: { temperatureK: 350 },
      species: [{ id: 'A', label: 'A', structures: [{ electronic: -1, gCorrection: 0.01 }] }, { id: 'B', label: 'B', structures: [{ electronic: -1.01, gCorrection: 0.01 }] }],
    });
    const found = findings(doc, 'temperature-mismatch');
    expect(found.map((f) => f.severity)).toEqual(['warning', 'warning']);
    expect(found[0]!.message).toBe('A: thermal correction computed at 298.15 K used at 350 K');
  });

  it('duplicate labels in one pathway are flagged (a cycle may repeat its first label at the end)', () => {
    expect(findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 10), typed('R', 'min', -1, { id: 'R2' })]), 'duplicate-label')).toHaveLength(1);
    expect(findings(onePathway([typed('R', 'min', 0), typed('T', 'ts', 10), typed('R', 'min', -1, { id: 'R2' })], {}, true), 'duplicate-label')).toHaveLength(0);
  });
});
