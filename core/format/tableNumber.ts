import { formatScientific } from './formatScientific.ts';

/** Significant figures of every non-energy number in the tables and the report (k, t½, K, TOF). */
export const TABLE_SIGNIFICANT_DIGITS = 4;

/** `value` rounded to the tables' significant figures; null for null or non-finite values. */
export function roundSignificant(value: number | null): number | null {
  return value === null || !Number.isFinite(value) ? null : Number(value.toPrecision(TABLE_SIGNIFICANT_DIGITS));
}

/**
 * A number already rounded for a table, as the report prints it: plain from 0.001 to below
 * 100 000 (typographic minus), else "1.235 × 10⁻⁵" to the tables' significant figures.
 * The Steps table and the uncertainty tables both print k through it, so one k reads the same.
 */
export function formatTableNumber(value: number): string {
  const a = Math.abs(value);
  return a !== 0 && (a >= 1e5 || a < 1e-3) ? formatScientific(value, TABLE_SIGNIFICANT_DIGITS) : String(value).replace(/-/g, '\u2212');
}
