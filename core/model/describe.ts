/** Short description of an offending value for messages. */
export function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  return Array.isArray(value) ? 'a list' : typeof value;
}
