import { describe, expect, it } from 'vitest';
import { createRawSnippet } from 'svelte';
import { fireEvent, render, screen } from '@testing-library/svelte';
import Tabs from '../../../../ui/components/Tabs.svelte';

describe('Tabs', () => {
  it('builds a panel the first time it is shown and keeps it, hidden, afterwards', async () => {
    let active = 'one';
    const panel = createRawSnippet((id: () => string) => ({ render: () => `<p>panel ${id()}</p>` }));
    const view = render(Tabs, { label: 'Views', tabs: [{ id: 'one', title: 'One' }, { id: 'two', title: 'Two' }], active, onchange: (id: string) => { active = id; }, panel });
    expect(screen.getByText('panel one')).toBeTruthy();
    expect(screen.queryByText('panel two')).toBeNull();
    await fireEvent.click(screen.getByRole('tab', { name: 'Two' }));
    await view.rerender({ active });
    expect(screen.getByText('panel two')).toBeTruthy();
    await view.rerender({ active: 'one' });
    // Still there (what was typed in it is kept), only hidden.
    expect(screen.getByText('panel two').closest('[role="tabpanel"]')!.hasAttribute('hidden')).toBe(true);
    expect(screen.getByRole('tab', { name: 'One' }).getAttribute('aria-selected')).toBe('true');
  });
});
