import type { Figure } from '../model/schema.ts';
import { unitLabel, type EnergyUnit } from '../units/energy.ts';

const MINUS = '\u2212';

/**
 * An energy for a label: rounded to `decimals`, sign always shown (+, − as U+2212 MINUS
 * SIGN), no sign on zero (so −0.04 at one decimal prints "0.0"), optionally in
 * parentheses or followed by the unit.
 */
export function formatEnergy(value: number, decimals: number, format: Figure['energyFormat'], unit: EnergyUnit): string {
  const fixed = Math.abs(value).toFixed(decimals);
  const zero = Number(fixed) === 0;
  const signed = zero ? fixed : `${value < 0 ? MINUS : '+'}${fixed}`;
  if (format === 'parentheses') return `(${signed})`;
  if (format === 'withUnit') return `${signed} ${unitLabel(unit)}`;
  return signed;
}
