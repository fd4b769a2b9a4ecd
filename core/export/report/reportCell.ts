import { formatScientific } from '../../format/formatScientific.ts';

/** A table cell as the report prints it: "—" when unknown, text as it is, numbers in the app's one notation. */
export function reportCell(value: string | number | null): string {
  if (value === null) return '—';
  if (typeof value === 'string') return value;
  // Very large or small numbers read better as "× 10ⁿ" (4 significant digits), the app's one notation.
  const a = Math.abs(value);
  return a !== 0 && (a >= 1e5 || a < 1e-3) ? formatScientific(value, 4) : String(value).replace(/-/g, '\u2212');
}
