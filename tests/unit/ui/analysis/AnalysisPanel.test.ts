import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/svelte';
import AnalysisPanel from '../../../../ui/analysis/AnalysisPanel.svelte';
import { routeStore } from '../editor/storeFixture.ts';

describe('AnalysisPanel', () => {
  it('shows the step with its barriers, Eyring rate constant with units, and half-life', () => {
    render(AnalysisPanel, { store: routeStore() });
    const table = screen.getByRole('table', { name: 'Steps of Route' });
    const cells = within(table).getAllByRole('cell').map((c) => c.textContent?.trim());
    // Δ‡G 20 kcal/mol at 298.15 K, κ = 1, first order: k = 0.0135881500479 s⁻¹, t½ = 51.0111514899 s
    // (REFERENCE.md §2, Eyring J. Chem. Phys. 3, 107 (1935)); reverse barrier 20 − (−5) = 25.
    expect(cells.slice(0, 5)).toEqual(['20.0', '25.0', '−5.0', '0.0136 s⁻¹', '2.94 × 10⁻⁶ s⁻¹']);
    expect(cells[6]).toBe('51.0 s');
  });

  it('names the effective barrier with its TS and intermediate, in the display unit', () => {
    render(AnalysisPanel, { store: routeStore() });
    const summary = screen.getByLabelText('Summary of Route');
    expect(summary.textContent).toContain('20.0 kcal mol⁻¹ (TS over A)');
  });

  it('says what the energies are measured from (the document-wide zero by default)', () => {
    render(AnalysisPanel, { store: routeStore() });
    expect(screen.getByLabelText('Reference').textContent).toMatch(/^Energies measured from: one document-wide zero/);
  });
});
