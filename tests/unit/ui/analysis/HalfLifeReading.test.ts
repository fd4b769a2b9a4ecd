import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import AnalysisPanel from '../../../../ui/analysis/AnalysisPanel.svelte';
import { routeStore } from '../editor/storeFixture.ts';

describe('AnalysisPanel half-life line', () => {
  it('puts a space between the half-life and its reading', () => {
    render(AnalysisPanel, { store: routeStore() });
    const summary = screen.getByLabelText('Summary of Route');
    const line = [...summary.querySelectorAll('div')].find((d) => d.textContent?.startsWith('Half-life it implies'))!;
    // Δ‡G 20 kcal/mol at 298.15 K, κ = 1: t½ = 51.0 s (REFERENCE.md §2, Eyring J. Chem. Phys. 3, 107 (1935)),
    // read as "seconds to minutes" (band edges 1 s and 1 min; common practice, core/kinetics/feasibilityReading.ts).
    expect(line.querySelector('dd')!.textContent).toMatch(/^51\.0 s — seconds to minutes/);
  });
});
