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
 * A number with `decimals` places and the typographic minus (−), the one minus sign the
 * app shows; "—" for a value that could not be had. Trailing zeros stay (they carry the precision).
 */
export function formatFixed(value: number | null, decimals: number): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const text = value.toFixed(decimals);
  // toFixed keeps the sign of tiny negatives ("-0.0"), which reads as a real value.
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace('-', '−');
}

/** A relative energy (J/mol) shown in `unit` with `decimals` places; "—" when it could not be resolved. */
export function formatEnergy(energyJ: number | null, unit: Unit, decimals: number): string {
  return formatFixed(energyJ === null ? null : fromJoulesPerMol(energyJ, unit), decimals);
}

/** A relative energy with its sign always written ("+31.8", "−9.6"); "—" when unresolved. */
export function formatSignedEnergy(energyJ: number | null, unit: Unit, decimals: number): string {
  const text = formatEnergy(energyJ, unit, decimals);
  return energyJ === null || text.startsWith('−') || text === '—' ? text : `+${text}`;
}

/** Column or axis title in quantity-calculus form, e.g. "ΔG / kcal mol⁻¹". */
export function energyHeading(quantity: Quantity, unit: Unit): string {
  return `Δ${quantity} / ${unitLabel(unit)}`;
}
