import type { ReportPathway } from '../../core/report/analysisReport.ts';
import type { UncertainReport } from '../../core/uncertainty/annotateReport.ts';
import { entryIntervalOf, intervalOf, type Holder } from '../../core/uncertainty/reportReaders.ts';
import type { ReportInterval } from '../../core/uncertainty/annotateReport.ts';

/** One row of the uncertainty panel: a number the analysis panel shows, and where its interval sits. */
export interface UncertaintyRow {
  label: string;
  holder: Holder;
  field: string;
  /** For an entry of a keyed table (a cycle's X_TOF): its key. */
  entry?: string;
  /** Energies print with the document's decimals, shares (X_TOF) in %, everything else in the app's scientific notation. */
  kind: 'energy' | 'number' | 'share';
}

const SYMBOL = { E: 'E', H: 'H', G: 'G' } as const;

/**
 * The rows of one pathway's uncertainty table, one per number the analysis panel shows for it
 * (summary, energetic span, step table), in the same order and with the same units.
 */
export function pathwayUncertaintyRows(report: UncertainReport, p: ReportPathway, unit: string): UncertaintyRow[] {
  const q = SYMBOL[report.quantity];
  const rows: UncertaintyRow[] = [];
  const row = (label: string, holder: object, field: string, kind: UncertaintyRow['kind']) => rows.push({ label, holder, field, kind });
  const eb = p.effectiveBarrier;
  if (eb) {
    row(`Effective barrier / ${unit}`, eb, 'value', 'energy');
    if (eb.halfLifeSeconds !== null) row('Half-life it implies / s', eb, 'halfLifeSeconds', 'number');
  }
  if (p.reactionEnergy !== null) row(`Overall Δr${q} / ${unit}`, p, 'reactionEnergy', 'energy');
  const span = p.energeticSpan;
  if (span) {
    row(`Energetic span δE / ${unit}`, span, 'deltaE', 'energy');
    row('TOF / s⁻¹', span, 'tof', 'number');
    row('TOF, δE approximation / s⁻¹', span, 'tofApprox', 'number');
    // The analysis panel lists states with X_TOF ≥ 0.5 %.
    for (const [key, x] of Object.entries(span.degreeOfTofControl)) if (x >= 0.005) rows.push({ label: `X_TOF ${key}`, holder: span, field: 'degreeOfTofControl', entry: key, kind: 'share' });
  }
  for (const s of p.steps) {
    const name = `${s.from} → ${s.to}`;
    row(`Δ${q}‡ fwd ${name} / ${unit}`, s, 'barrierForward', 'energy');
    row(`Δ${q}‡ rev ${name} / ${unit}`, s, 'barrierReverse', 'energy');
    row(`Δr${q} ${name} / ${unit}`, s, 'reactionEnergy', 'energy');
    row(`k ${name} / ${s.kForwardUnit}`, s, 'kForward', 'number');
    row(`k₋ ${name} / ${s.kReverseUnit}`, s, 'kReverse', 'number');
    row(`K ${name}`, s, 'equilibriumConstant', 'number');
    row(`t½ ${name} / s`, s, 'halfLifeSeconds', 'number');
  }
  return rows;
}

/** The interval of a row, or null when the run gave none. */
export function rowInterval(r: UncertaintyRow): ReportInterval | null {
  return r.entry === undefined ? intervalOf(r.holder, r.field) : entryIntervalOf(r.holder, r.field, r.entry);
}
