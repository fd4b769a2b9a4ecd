import type { ReportInterval } from './annotateReport.ts';

/** Any object of an annotated report that may hold Monte Carlo results. */
export type Holder = object & { uncertainty?: Record<string, unknown> };

/** The interval `annotateReport` put beside `field` of `holder`, or null. */
export function intervalOf(holder: Holder | null | undefined, field: string): ReportInterval | null {
  return (holder?.uncertainty?.[field] as ReportInterval | undefined) ?? null;
}

/** The interval of entry `key` of a keyed table `field` (a cycle's `degreeOfTofControl`), or null. */
export function entryIntervalOf(holder: Holder | null | undefined, field: string, key: string): ReportInterval | null {
  return ((holder?.uncertainty?.[field] as Record<string, ReportInterval> | undefined)?.[key]) ?? null;
}

/** The outcome probabilities of a categorical result (`tdts`, `tdi`, `faster`, `major`), most likely first. */
export function probabilitiesOf(holder: Holder | null | undefined, field: string): [string, number][] {
  const p = holder?.uncertainty?.[`${field}Probability`] as Record<string, number> | undefined;
  return p ? Object.entries(p).sort((a, b) => b[1] - a[1]) : [];
}
