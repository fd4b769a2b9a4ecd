import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import SettingsBar from '../../../../ui/components/SettingsBar.svelte';
import { makeDocument } from '../../../../core/model/load.ts';

describe('SettingsBar', () => {
  it('names the axis from quantity and unit and reports changes', async () => {
    const onchange = vi.fn();
    render(SettingsBar, { doc: makeDocument({}), onchange, onreference: vi.fn() });
    expect(screen.getByRole('group', { name: 'Document settings' }).textContent).toContain('Axis: ΔG / kcal mol⁻¹');
    await fireEvent.change(screen.getByRole('combobox', { name: 'Unit' }), { target: { value: 'kJ/mol' } });
    expect(onchange).toHaveBeenLastCalledWith({ unit: 'kJ/mol' });
    await fireEvent.change(screen.getByRole('combobox', { name: 'Standard state' }), { target: { value: '1atm-to-1M' } });
    expect(onchange).toHaveBeenLastCalledWith({ standardState: '1atm-to-1M' });
  });

  it('refuses a temperature at or below 0 K with a message, and passes a good one on', async () => {
    const onchange = vi.fn();
    render(SettingsBar, { doc: makeDocument({}), onchange, onreference: vi.fn() });
    const field = screen.getByRole('textbox', { name: 'Temperature' });
    await fireEvent.focus(field);
    await fireEvent.input(field, { target: { value: '0' } });
    expect(screen.getByRole('alert').textContent).toBe('temperature 0 K is outside 1 to 10000 K');
    expect(onchange).not.toHaveBeenCalled();
    await fireEvent.input(field, { target: { value: '310' } });
    expect(onchange).toHaveBeenLastCalledWith({ temperatureK: 310 }, 'temperature');
  });
});
