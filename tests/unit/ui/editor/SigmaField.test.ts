import { describe, expect, it } from 'vitest';
import { tick } from 'svelte';
import { fireEvent, render, screen } from '@testing-library/svelte';
import MechanismPanel from '../../../../ui/editor/MechanismPanel.svelte';
import { setSettings } from '../../../../core/edit/settingsEdits.ts';
import { setEnergy } from '../../../../core/edit/pointEdits.ts';
import { routeStore } from './storeFixture.ts';

// The route of storeFixture: A 0, TS a barrier of 20 kcal/mol, B −5 (invented).
const ts = (store: ReturnType<typeof routeStore>) => store.doc.pathways[0]!.points[1]!.energy as { mode: string; value: number; unit: string; sigma?: number };
const sigmaBox = () => screen.getByRole('textbox', { name: 'TS energy σ' }) as HTMLInputElement;

async function type(field: HTMLInputElement, text: string) {
  await fireEvent.focus(field);
  await fireEvent.input(field, { target: { value: text } });
}

describe('the σ beside a typed energy', () => {
  it('takes a σ in the value’s unit, and emptying the field removes it from the document', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    expect(sigmaBox().value).toBe('');
    await type(sigmaBox(), '1.5');
    expect(ts(store)).toEqual({ mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1.5 });
    await type(sigmaBox(), '');
    expect(ts(store)).toEqual({ mode: 'barrier', value: 20, unit: 'kcal/mol' });
    expect('sigma' in ts(store)).toBe(false);
    await type(sigmaBox(), '0');
    expect(ts(store).sigma).toBe(0);
  });

  it.each([
    ['-1', /σ: expected a standard uncertainty ≥ 0, got -1/],
    ['abc', /σ: expected a number in kcal mol⁻¹/],
    ['NaN', /σ: expected a number in kcal mol⁻¹/],
    ['1e400', /σ: expected a number in kcal mol⁻¹/],
    // 5000 kcal/mol = 20 920 kJ/mol, past the 10 000 kJ/mol limit of core/model/bounds.ts
    ['5000', /σ: standard uncertainty σ 20920 kJ\/mol is outside 0 to 10000 kJ\/mol/],
  ])('refuses %s with a message naming σ and keeps the previous σ', async (text, message) => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await type(sigmaBox(), '1.5');
    const before = store.doc;
    await type(sigmaBox(), text);
    expect(screen.getByRole('alert').textContent).toMatch(message);
    expect(sigmaBox().getAttribute('aria-invalid')).toBe('true');
    expect(store.doc).toBe(before);
    expect(ts(store).sigma).toBe(1.5);
    // The energy itself is not marked unresolved by a refused σ.
    expect(store.unresolved).toEqual([]);
  });

  it('a typing burst is one undo step; undo and redo bring the σ back and forth', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await type(sigmaBox(), '1');
    await type(sigmaBox(), '1.2');
    await fireEvent.blur(sigmaBox());
    store.endGroup();
    expect(ts(store).sigma).toBe(1.2);
    store.undo();
    await tick();
    expect(ts(store).sigma).toBeUndefined();
    expect(sigmaBox().value).toBe('');
    store.redo();
    await tick();
    expect(ts(store).sigma).toBe(1.2);
    expect(sigmaBox().value).toBe('1.2');
    // Both keystrokes were one step: one more undo leaves nothing to undo.
    store.undo();
    expect(store.canUndo).toBe(false);
  });

  it('changing the unit converts σ with the value: 1.5 kcal/mol is 6.276 kJ/mol', async () => {
    // 1 kcal = 4.184 kJ exactly (thermochemical calorie, NIST SP 811 App. B.8; REFERENCE.md §1).
    const store = routeStore();
    render(MechanismPanel, { store });
    await type(sigmaBox(), '1.5');
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy unit' }), { target: { value: 'kJ/mol' } });
    expect(ts(store).unit).toBe('kJ/mol');
    expect(ts(store).value).toBeCloseTo(83.68, 8);
    expect(ts(store).sigma).toBeCloseTo(6.276, 8);
    await fireEvent.blur(sigmaBox());
    expect(sigmaBox().value).toBe('6.276');
    // No σ stays no σ.
    await type(sigmaBox(), '');
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy unit' }), { target: { value: 'kcal/mol' } });
    expect('sigma' in ts(store)).toBe(false);
  });

  it('switching a barrier to a typed value keeps its σ', async () => {
    const store = routeStore();
    render(MechanismPanel, { store });
    await type(sigmaBox(), '2');
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS energy given as' }), { target: { value: 'value' } });
    expect(ts(store)).toEqual({ mode: 'value', value: 20, unit: 'kcal/mol', sigma: 2 });
  });

  it('says in the placeholder and hint whether the document’s default σ applies to an empty field', () => {
    const store = routeStore();
    store.apply(setSettings(store.doc, { uncertainty: { defaultSigma: 1, defaultSigmaUnit: 'kcal/mol', samples: 100, seed: 1 } }));
    store.apply(setEnergy(store.doc, { pathway: 'p', point: 't', energy: { mode: 'barrier', value: 20, unit: 'kJ/mol' } }));
    render(MechanismPanel, { store });
    // 1 kcal/mol shown in the field's kJ/mol: 4.184.
    expect(sigmaBox().placeholder).toBe('(4.2)');
    expect(sigmaBox().title).toMatch(/Empty: the document's default σ \(1 kcal mol⁻¹\) applies/);
    // A: the typed 0 that defines the zero takes no default σ.
    const first = screen.getByRole('textbox', { name: 'A energy σ' }) as HTMLInputElement;
    expect(first.placeholder).toBe('σ');
    expect(first.title).toMatch(/Empty: no σ \(the document default σ does not apply here\)/);
  });
});

describe('the σ of an estimate’s input', () => {
  it('Marcus λ takes a σ that converts with its unit and refuses a negative one', async () => {
    const store = routeStore();
    store.apply(setEnergy(store.doc, { pathway: 'p', point: 't', energy: { mode: 'estimate', estimate: { method: 'marcus', lambda: 40, unit: 'kcal/mol' } } }));
    render(MechanismPanel, { store });
    const field = screen.getByRole('textbox', { name: 'TS λ σ' }) as HTMLInputElement;
    expect(field.title).toMatch(/no document default σ is set/);
    await type(field, '3');
    const est = () => (store.doc.pathways[0]!.points[1]!.energy as { estimate: { lambda: number; lambdaSigma?: number; unit: string } }).estimate;
    expect(est().lambdaSigma).toBe(3);
    await type(field, '−2');
    expect(screen.getByRole('alert').textContent).toMatch(/σ of λ: expected a standard uncertainty ≥ 0/);
    expect(est().lambdaSigma).toBe(3);
    await fireEvent.change(screen.getByRole('combobox', { name: 'TS λ unit' }), { target: { value: 'kJ/mol' } });
    // 3 kcal/mol × 4.184 = 12.552 kJ/mol (NIST SP 811 App. B.8).
    expect(est()).toMatchObject({ unit: 'kJ/mol', lambdaSigma: 12.552 });
    expect(est().lambda).toBeCloseTo(167.36, 8);
  });

  it('BEP E₀ takes a σ and an emptied field removes it', async () => {
    const store = routeStore();
    store.apply(setEnergy(store.doc, { pathway: 'p', point: 't', energy: { mode: 'estimate', estimate: { method: 'bep', e0: 20, alpha: 0.5, unit: 'kcal/mol' } } }));
    render(MechanismPanel, { store });
    const field = screen.getByRole('textbox', { name: 'TS E₀ σ' }) as HTMLInputElement;
    await type(field, '1');
    expect(store.doc.pathways[0]!.points[1]!.energy).toMatchObject({ estimate: { e0Sigma: 1 } });
    await type(field, '');
    expect('e0Sigma' in (store.doc.pathways[0]!.points[1]!.energy as { estimate: object }).estimate).toBe(false);
  });
});
