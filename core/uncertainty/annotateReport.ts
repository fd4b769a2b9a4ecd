import type { AnalysisReport } from '../report/analysisReport.ts';
import { fromJoulesPerMol, type EnergyUnit } from '../units/energy.ts';
import type { QuantityScale } from './derivedQuantities.ts';
import type { UncertaintyResult } from './uncertaintyRun.ts';

/** An interval in the report's units. */
export interface ReportInterval { median: number; low: number; high: number }

/** What `analyze --uncertainty --json` adds at the top of the report. */
export interface ReportUncertainty {
  method: string;
  samples: number;
  seed: number;
  interval: string;
  inputs: { input: string; key: string; sigma: number; unit: string; default: boolean }[];
  /** Variance shares of ln TOF (cycles) or the effective barrier (linear pathways), largest first. */
  rateSensitivity: { pathway: string; target: string; shares: { input: string; share: number }[] }[];
}

export type UncertainReport = AnalysisReport & { uncertainty: ReportUncertainty };

/** A stored-scale value in the report's units. */
export function reportValue(value: number, scale: QuantityScale, unit: EnergyUnit): number {
  return scale === 'energy' ? fromJoulesPerMol(value, unit) : scale === 'log' ? Math.exp(value) : value;
}

function objectAt(root: unknown, path: readonly (string | number)[]): Record<string, unknown> | null {
  let at: unknown = root;
  for (const step of path) {
    if (at === null || typeof at !== 'object') return null;
    at = (at as Record<string | number, unknown>)[step];
  }
  return at !== null && typeof at === 'object' ? (at as Record<string, unknown>) : null;
}

/**
 * The analysis report with the Monte Carlo results beside each quantity: every object that
 * holds a sampled number gets an `uncertainty` object with `{ median, low, high }` under the
 * number's field name (a keyed table's entries, such as a cycle's X_TOF, under field → key; energies in the report's unit, rates and ratios as numbers; an ee
 * signed toward the point estimate's major product, negative where the other wins), and
 * `<field>Probability` maps for categorical results (TDTS, TDI, faster pathway, major
 * product). The top-level `uncertainty` states N, the seed and every input σ.
 */
export function annotateReport(report: AnalysisReport, result: UncertaintyResult): UncertainReport {
  const out = structuredClone(report) as UncertainReport;
  const holder = (path: readonly (string | number)[]) => {
    const parent = objectAt(out, path);
    if (!parent) return null;
    return (parent.uncertainty ??= {}) as Record<string, unknown>;
  };
  for (const q of result.quantities) {
    const h = holder(q.path);
    if (!h || !q.interval) continue;
    const v = (x: number) => reportValue(x, q.scale, report.unit);
    const interval = { median: v(q.interval.median), low: v(q.interval.low), high: v(q.interval.high) } satisfies ReportInterval;
    if (q.entry === undefined) h[q.field] = interval;
    else ((h[q.field] ??= {}) as Record<string, ReportInterval>)[q.entry] = interval;
  }
  for (const c of result.choices) {
    const h = holder(c.path);
    if (h) h[`${c.field}Probability`] = c.probabilities;
  }
  const label = new Map(result.inputs.map((i) => [i.key, i.label]));
  out.uncertainty = {
    method: `Monte Carlo over normal input errors${result.inputs.some((i) => i.distribution === 'logNormal') ? ', log-normal for rate constants and half-lives' : ''} (${result.method === 'full' ? 'every sample resolved and analysed' : 'linear resolution once per input, every sample analysed'})`,
    samples: result.samples,
    seed: result.seed,
    interval: 'median and 95 % interval (2.5th–97.5th percentiles)',
    inputs: result.inputs.map((i) => ({ input: i.label, key: i.key, sigma: i.sigma, unit: i.unit, default: i.isDefault })),
    rateSensitivity: result.sensitivity.map((s) => ({ pathway: s.pathway, target: s.target, shares: s.shares.map((x) => ({ input: label.get(x.key) ?? x.key, share: x.share })) })),
  };
  return out;
}
