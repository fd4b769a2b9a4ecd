import type { Quantity } from '../model/schema.ts';
import { unitLabel, type EnergyUnit } from '../units/energy.ts';

/** The y-axis title: relative quantity over unit, e.g. "ΔG / kcal mol⁻¹" (quantity / unit, IUPAC Green Book style). */
export function axisTitle(quantity: Quantity, unit: EnergyUnit): string {
  return `Δ${quantity} / ${unitLabel(unit)}`;
}
