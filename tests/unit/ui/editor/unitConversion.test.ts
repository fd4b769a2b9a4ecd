import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { makeDocument } from '../../../../core/model/load.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { createFakeHost } from '../host/fakeHost.ts';

/**
 * An invented route typed in kJ/mol: A 0, TS 80 (a typed value), B from a Marcus estimate
 * with λ = 80 kJ/mol. The check value is independent of the app's constants: 1 kcal = 4.184 kJ
 * exactly (thermochemical calorie, ISO 80000-5 / NIST SP 811 Appendix B.8), so
 * 80 kJ/mol = 80 / 4.184 = 19.120458891… kcal/mol.
 */
function kjStore(): DocumentStore {
  const doc = makeDocument({
    title: 'Invented kJ route',
    pathways: [{
      id: 'p', name: 'Route', points: [
        { id: 'a', label: 'A', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kJ/mol' } },
        { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'value', value: 80, unit: 'kJ/mol' } },
        { id: 'b', label: 'B', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'marcus', lambda: 80, unit: 'kJ/mol' } } },
      ],
    }],
  });
  return new DocumentStore(createFakeHost().host, doc, 'kj.passline');
}

const KCAL_PER_80_KJ = 80 / 4.184;

describe('changing an input unit keeps the energy', () => {
  it('a typed value: 80 kJ/mol becomes 19.12 kcal/mol, and the resolved energy does not move', async () => {
    const store = kjStore();
    render(MechanismPanel, { store });
    const before = store.profile.pathways[0]!.points[1]!.energyJ;
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy unit' }), { target: { value: 'kcal/mol' } });
    const energy = store.doc.pathways[0]!.points[1]!.energy as { value: number; unit: string };
    expect(energy.unit).toBe('kcal/mol');
    expect(energy.value).toBeCloseTo(KCAL_PER_80_KJ, 8);
    expect(energy.value.toFixed(2)).toBe('19.12');
    expect((screen.getByRole('textbox', { name: 'TS energy' }) as HTMLInputElement).value).toMatch(/^19\.12/);
    expect(store.profile.pathways[0]!.points[1]!.energyJ).toBeCloseTo(before!, 3);
    // and back: the number returns to 80 (not 19.12 reinterpreted as kJ/mol)
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy unit' }), { target: { value: 'kJ/mol' } });
    expect((store.doc.pathways[0]!.points[1]!.energy as { value: number }).value).toBeCloseTo(80, 8);
  });

  it('an estimate input: Marcus λ 80 kJ/mol becomes 19.12 kcal/mol', async () => {
    const store = kjStore();
    render(MechanismPanel, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'B λ unit' }), { target: { value: 'kcal/mol' } });
    const energy = store.doc.pathways[0]!.points[2]!.energy as { estimate: { lambda: number; unit: string } };
    expect(energy.estimate.unit).toBe('kcal/mol');
    expect(energy.estimate.lambda).toBeCloseTo(KCAL_PER_80_KJ, 8);
    expect(energy.estimate.lambda.toFixed(2)).toBe('19.12');
    expect((screen.getByRole('textbox', { name: 'B reorganisation energy λ' }) as HTMLInputElement).value).toMatch(/^19\.12/);
  });
});
