import type { PointKind, Quantity, Unit } from '../../core/model/schema.ts';
import { fromJoulesPerMol, unitLabel } from '../../core/units/energy.ts';

/** Words for each quantity, as a chemist would say them. */
export const QUANTITY_NAMES: Record<Quantity, string> = {
  E: 'electronic energy',
  H: 'enthalpy',
  G: 'Gibbs energy',
};

/** Words for each kind of stationary point. */
export const KIND_NAMES: Record<PointKind, string> = {
  min: 'minimum',
  ts: 'transition state',
};

/**
 * A relative energy (J/mol) shown in `unit` with `decimals` places; "—" when it could not
 * be resolved. Plain ASCII minus so that values pasted into a spreadsheet stay numbers.
 */
export function formatEnergy(energyJ: number | null, unit: Unit, decimals: number): string {
  if (energyJ === null) return '—';
  const text = fromJoulesPerMol(energyJ, unit).toFixed(decimals);
  // toFixed keeps the sign of tiny negatives ("-0.0"), which reads as a real value.
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** Column or axis title in quantity-calculus form, e.g. "ΔG / kcal mol⁻¹". */
export function energyHeading(quantity: Quantity, unit: Unit): string {
  return `Δ${quantity} / ${unitLabel(unit)}`;
}
