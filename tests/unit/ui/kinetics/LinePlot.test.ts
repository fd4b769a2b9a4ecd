import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import LinePlot from '../../../../ui/kinetics/LinePlot.svelte';

describe('LinePlot bands', () => {
  it('shades a series band, keys it, and lets the axis reach the band ends', () => {
    const series = [{ name: 'k', xs: [300, 350, 400], ys: [1, 2, 3], band: { low: [0.5, 1, 2], high: [10, 20, 40] } }];
    const { container } = render(LinePlot, { series, title: 'k against T', xLabel: 'T / K', yLabel: 'k / s⁻¹', yLog: true });
    const band = container.querySelector('path.band');
    expect(band?.getAttribute('d')).toMatch(/^M/);
    expect(screen.getByText(/95 % interval/)).toBeTruthy();
    // A log axis from the band's 0.5 to 40 shows the decade ticks 10⁰ and 10¹ (the line alone spans 1–3: only 10⁰).
    expect(screen.getByText('10¹')).toBeTruthy();
  });

  it('draws no band and no band key without one', () => {
    const { container } = render(LinePlot, { series: [{ name: 'k', xs: [1, 2], ys: [1, 2] }], title: 't', xLabel: 'x', yLabel: 'y' });
    expect(container.querySelector('path.band')).toBeNull();
    expect(screen.queryByText(/95 % interval/)).toBeNull();
  });
});
