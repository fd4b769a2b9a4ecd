import type { AnalysisReport } from '../report/analysisReport.ts';
import { unitLabel } from '../units/energy.ts';
import type { Table } from './tables.ts';

/** The analysis as tables, each ready for tableToCsv / tableToMarkdown. */
export interface AnalysisTables {
  points: Table;
  steps: Table;
  effectiveBarriers: Table;
  energeticSpans: Table;
  comparisons: Table;
}

/**
 * Tables of an analysis report (display-unit energies, SI rates): points with provenance,
 * steps (barriers, reaction energies, Eyring k with their units, K, half-lives), effective
 * barriers, energetic span results and comparisons. Every header names its unit;
 * rate constants, whose unit depends on molecularity, carry it in the next column.
 * Energies are rounded to `decimals`, other numbers to 4 significant digits.
 */
export function analysisTables(report: AnalysisReport, decimals: number): AnalysisTables {
  const u = unitLabel(report.unit);
  const q = report.quantity;
  const e = (v: number | null) => (v === null ? null : round(v, decimals));
  const steps: Table['rows'] = [];
  const barriers: Table['rows'] = [];
  const spans: Table['rows'] = [];
  for (const p of report.pathways) {
    for (const s of p.steps) {
      steps.push([p.name, s.from, s.ts ?? '(no TS)', s.to, e(s.barrierForward), e(s.barrierReverse), e(s.reactionEnergy),
        sig(s.kForward), s.kForwardUnit, sig(s.kReverse), s.kReverseUnit, sig(s.equilibriumConstant), sig(s.halfLifeSeconds)]);
    }
    const eb = p.effectiveBarrier;
    if (eb) barriers.push([p.name, e(eb.value), eb.intermediate, eb.ts, sig(eb.halfLifeSeconds), eb.reading]);
    const sp = p.energeticSpan;
    if (sp) spans.push([p.name, e(sp.deltaE), sp.tdts, sp.tdi, sig(sp.tof), sig(sp.tofApprox), e(sp.apparentBarrier), e(sp.reactionEnergy)]);
  }
  return {
    points: {
      columns: ['pathway', 'point', 'kind', `Δ${q} / ${u}`, 'source'],
      rows: report.pathways.flatMap((p) => p.points.map((pt) => [p.name, pt.label, pt.kind === 'ts' ? 'TS' : 'minimum', e(pt.energy), pt.provenance.detail])),
    },
    steps: {
      columns: ['pathway', 'from', 'TS', 'to', `Δ${q}‡ forward / ${u}`, `Δ${q}‡ reverse / ${u}`, `Δ${q} step / ${u}`,
        'k forward (unit in next column)', 'k forward unit', 'k reverse (unit in next column)', 'k reverse unit', 'K (c° = 1 mol L⁻¹)', 't½ forward / s'],
      rows: steps,
    },
    effectiveBarriers: {
      columns: ['pathway', `effective barrier Δ${q}‡ / ${u}`, 'from intermediate', 'to TS', 't½ / s', 'reading (common practice)'],
      rows: barriers,
    },
    energeticSpans: {
      columns: ['cycle', `δE / ${u}`, 'TDTS', 'TDI', 'TOF / s⁻¹', 'TOF, δE approximation / s⁻¹', `apparent barrier / ${u}`, `Δ${q}r per turnover / ${u}`],
      rows: spans,
    },
    comparisons: {
      columns: ['comparison', 'pathways', `ΔΔ${q}‡ (baseline − candidate; selectivity: TS gap) / ${u}`, 'rate or product ratio (dimensionless)', 'log₁₀ rate ratio', 'product shares / %', 'ee / %'],
      rows: report.comparisons.map((c) => c.type === 'rate'
        ? [`rate: ${c.candidate} vs ${c.baseline}`, `${c.candidate}; ${c.baseline}`, e(c.ddG), sig(c.rateRatio), sig(c.log10RateRatio), null, null]
        : [c.assumption ? 'selectivity (Curtin–Hammett)' : 'selectivity', c.pathways.join('; '), e(c.ddG), sig(c.ratio), null,
          c.products.map((p) => `${p.pathway} ${p.percent.toFixed(1)}`).join('; '), c.ee === null ? null : round(100 * c.ee, 1)]),
    },
  };
}

function round(value: number, decimals: number): number {
  const r = Number(value.toFixed(decimals));
  return Object.is(r, -0) ? 0 : r;
}

function sig(value: number | null): number | null {
  return value === null || !Number.isFinite(value) ? null : Number(value.toPrecision(4));
}
