import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/svelte';
import PathwayTable from '../../../../ui/components/PathwayTable.svelte';
import type { ResolvedPathway, ResolvedPoint } from '../../../../core/profile/types.ts';

const point = (id: string, kind: 'min' | 'ts', energyJ: number | null, detail = 'typed'): ResolvedPoint => ({
  id, label: id.toUpperCase(), kind, energyJ, provenance: { route: 'typed', detail, approximations: [] },
});

// Energies in J/mol chosen so the kcal/mol values are exact: 1 kcal = 4184 J (thermochemical
// calorie, NIST SP 811 App. B, as in REFERENCE.md §1).
const pathway: ResolvedPathway = {
  id: 'route', name: 'Invented route', cycle: false,
  points: [point('a', 'min', 0), point('t', 'ts', 20.5 * 4184), point('b', 'min', -3.25 * 4184), point('x', 'min', null, 'no energy given')],
};

function rowOf(label: string): HTMLElement {
  return screen.getByRole('rowheader', { name: label }).closest('tr') as HTMLElement;
}

describe('PathwayTable', () => {
  it('is a table named after the pathway with the quantity and unit in the energy header', () => {
    render(PathwayTable, { pathway, quantity: 'G', unit: 'kcal/mol', decimals: 1 });
    const table = screen.getByRole('table', { name: 'Invented route' });
    expect(within(table).getByRole('columnheader', { name: 'ΔG / kcal mol⁻¹' })).toBeTruthy();
  });

  it('lists every point with its kind and its energy converted to the display unit', () => {
    render(PathwayTable, { pathway, quantity: 'G', unit: 'kcal/mol', decimals: 2 });
    const cells = (label: string) => within(rowOf(label)).getAllByRole('cell').map((c) => c.textContent?.trim());
    expect(cells('A').slice(0, 2)).toEqual(['minimum', '0.00']);
    expect(cells('T').slice(0, 2)).toEqual(['transition state', '20.50']);
    expect(cells('B').slice(0, 2)).toEqual(['minimum', '-3.25']);
  });

  it('converts to kJ/mol when that is the display unit', () => {
    render(PathwayTable, { pathway, quantity: 'H', unit: 'kJ/mol', decimals: 3 });
    expect(screen.getByRole('columnheader', { name: 'ΔH / kJ mol⁻¹' })).toBeTruthy();
    // 20.5 kcal/mol x 4.184 kJ/kcal = 85.772 kJ/mol (NIST SP 811 App. B).
    expect(within(rowOf('T')).getAllByRole('cell')[1]?.textContent?.trim()).toBe('85.772');
  });

  it('shows a dash and the provenance for a point without an energy', () => {
    render(PathwayTable, { pathway, quantity: 'G', unit: 'kcal/mol', decimals: 1 });
    const cells = within(rowOf('X')).getAllByRole('cell');
    expect(cells[1]?.textContent?.trim()).toBe('—');
    expect(cells[2]?.textContent).toContain('no energy given');
  });

  it('marks a catalytic cycle and says when a pathway has no points', () => {
    render(PathwayTable, { pathway: { ...pathway, cycle: true, points: [] }, quantity: 'G', unit: 'eV', decimals: 1 });
    expect(screen.getByText('catalytic cycle')).toBeTruthy();
    expect(screen.getByText('This pathway has no points yet.')).toBeTruthy();
  });
});
