import { formatTableNumber } from '../../format/tableNumber.ts';

/** A table cell as the report prints it: "—" when unknown, text as it is, numbers in the tables' one notation. */
export function reportCell(value: string | number | null): string {
  if (value === null) return '—';
  return typeof value === 'string' ? value : formatTableNumber(value);
}
