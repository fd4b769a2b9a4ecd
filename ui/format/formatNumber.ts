import { formatScientific } from '../../core/format/formatScientific.ts';

// One formatter for numbers in the app and in core's messages.
export { formatScientific };

const SPANS: [number, string][] = [[365.25 * 86400, 'yr'], [86400, 'd'], [3600, 'h'], [60, 'min'], [1, 's']];

/** A duration in seconds as a person reads it: "2.4 h", "3.1 × 10⁻⁵ s", "1.2 × 10⁶ yr". */
export function formatDuration(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds)) return seconds === Number.POSITIVE_INFINITY ? '∞' : '—';
  if (seconds < 60) return `${formatScientific(seconds)} s`;
  const [size, name] = SPANS.find(([s]) => seconds >= s)!;
  return `${formatScientific(seconds / size)} ${name}`;
}
