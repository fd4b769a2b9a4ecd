import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import AnalysisPanel from '../../../../ui/analysis/AnalysisPanel.svelte';
import { insertPathway } from '../../../../core/edit/pathwayEdits.ts';
import { routeStore } from '../editor/storeFixture.ts';

describe('ComparisonEditor', () => {
  it('adds a rate comparison in the order picked (first against second) and shows ΔΔG‡ with its unit', async () => {
    const store = routeStore();
    const [a, t, b] = store.doc.pathways[0]!.points;
    // A second invented route whose TS sits 2.0 kcal/mol lower (18 vs 20 over the same start).
    store.apply(insertPathway(store.doc, { pathway: { name: 'Faster', cycle: false, style: { visible: true }, points: [a!, { ...t!, energy: { mode: 'barrier', value: 18, unit: 'kcal/mol' } }, b!] } }));
    render(AnalysisPanel, { store });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Pathway' }), { target: { value: 'faster' } });
    await fireEvent.change(screen.getByRole('combobox', { name: 'against' }), { target: { value: 'p' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Add rate comparison' }));
    expect(store.doc.comparisons).toEqual([{ type: 'rate', baseline: 'p', candidate: 'faster' }]);
    // Faster's effective barrier is 2.0 kcal/mol below Route's (18 vs 20), so its rate is
    // 5.40760656537² = 29.2 times Route's (REFERENCE.md §2: a factor 5.40760656537 per
    // kcal/mol at 298.15 K, from the Eyring equation).
    expect(screen.getByRole('list', { name: 'Comparisons' }).textContent?.trim()).toBe('Faster vs Route: ΔΔG‡ = 2.0 kcal mol⁻¹; rate ratio 29.2');
    expect((screen.getByRole('button', { name: 'Add rate comparison' }) as HTMLButtonElement).disabled).toBe(true);
  });
});
