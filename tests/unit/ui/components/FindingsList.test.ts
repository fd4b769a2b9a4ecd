import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import FindingsList from '../../../../ui/components/FindingsList.svelte';
import type { ResolvedPathway } from '../../../../core/profile/types.ts';

const pathways: ResolvedPathway[] = [{
  id: 'cat', name: 'Catalysed', cycle: false,
  points: [{ id: 'ts1', label: 'TS1', kind: 'ts', energyJ: 0, provenance: { route: 'typed', detail: '', approximations: [] } }],
}];

describe('FindingsList', () => {
  it('lists each finding with its severity and where it applies, by the names people see', () => {
    render(FindingsList, {
      pathways,
      findings: [
        { severity: 'warning', code: 'ts-below-neighbour', message: 'lies below a neighbouring minimum', pathway: 'cat', point: 'ts1' },
        { severity: 'info', code: 'note', message: 'a document-wide note' },
      ],
    });
    const items = screen.getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' ').trim());
    expect(items).toEqual(['warning Catalysed, TS1: lies below a neighbouring minimum', 'info a document-wide note']);
    expect(screen.getByRole('heading', { name: 'Findings (2)' })).toBeTruthy();
  });

  it('shows nothing when there are no findings', () => {
    render(FindingsList, { pathways, findings: [] });
    expect(screen.queryByRole('list')).toBeNull();
  });

  it('picking a finding about a point selects that point', async () => {
    const onselect = vi.fn();
    render(FindingsList, {
      pathways, onselect,
      findings: [{ severity: 'error', code: 'ts-below-neighbour', message: 'lies below a neighbouring minimum', pathway: 'cat', point: 'ts1' }],
    });
    await fireEvent.click(screen.getByRole('button', { name: 'Catalysed, TS1:' }));
    expect(onselect).toHaveBeenCalledWith('cat', 'ts1');
  });
});

describe('FindingsList on a long list', () => {
  const many = Array.from({ length: 120 }, (_, i) => ({ severity: 'warning' as const, code: 'duplicate-label', message: `finding number ${i + 1}` }));

  it('shows the first 50 with the full count, and all of them on request', async () => {
    render(FindingsList, { pathways, findings: many });
    expect(screen.getByRole('heading', { name: 'Findings (120)' })).toBeTruthy();
    expect(screen.getAllByRole('listitem')).toHaveLength(50);
    const more = screen.getByRole('button', { name: 'Show all 120 findings' });
    expect(more.getAttribute('aria-expanded')).toBe('false');
    await fireEvent.click(more);
    expect(screen.getAllByRole('listitem')).toHaveLength(120);
    expect(screen.getAllByRole('listitem').at(-1)?.textContent).toContain('finding number 120');
    await fireEvent.click(screen.getByRole('button', { name: 'Show the first 50 only' }));
    expect(screen.getAllByRole('listitem')).toHaveLength(50);
  });
});
