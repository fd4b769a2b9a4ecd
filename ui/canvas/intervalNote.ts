import type { Unit } from '../../core/model/schema.ts';
import type { UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import { unitLabel } from '../../core/units/energy.ts';
import { formatEnergy } from '../format/formatEnergy.ts';
import { formatScientific } from '../format/formatNumber.ts';

/**
 * The 95 % interval of one sampled quantity as hover text, e.g. "95 %: 28.9 to 34.7 kcal mol⁻¹"
 * (energies in the display unit, rates as numbers with `rateUnit`); null without a finished
 * run for this document or where no σ reaches the quantity.
 */
export function intervalNote(result: UncertaintyResult | undefined, key: string, unit: Unit, decimals: number, rateUnit = ''): string | null {
  const q = result?.quantities.find((x) => x.key === key);
  const i = q?.interval;
  if (!q || !i || i.high === i.low) return null;
  if (q.scale === 'energy') return `95 %: ${formatEnergy(i.low, unit, decimals)} to ${formatEnergy(i.high, unit, decimals)} ${unitLabel(unit)}`;
  const show = (v: number) => formatScientific(q.scale === 'log' ? Math.exp(v) : v);
  return `95 %: ${show(i.low)} to ${show(i.high)}${rateUnit ? ` ${rateUnit}` : ''}`;
}

/** What every hover interval states once: N and the seed. */
export function runNote(result: UncertaintyResult | undefined): string {
  return result ? `Monte Carlo, N = ${result.samples}, seed ${result.seed}` : '';
}
