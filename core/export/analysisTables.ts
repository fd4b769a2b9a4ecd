import type { AnalysisReport, ReportComparison, ReportPathway } from '../report/analysisReport.ts';
import type { UncertainReport } from '../uncertainty/annotateReport.ts';
import { probabilitiesOf, type Holder } from '../uncertainty/reportReaders.ts';
import { unitLabel } from '../units/energy.ts';
import { roundSignificant as sig } from '../format/tableNumber.ts';
import { buildTable, type IntervalSpec, type TableSpec } from './columnSpec.ts';
import type { Table } from './tables.ts';
import { uncertaintyTables, type UncertaintyTables } from './uncertaintyTables.ts';

/** The analysis as tables, each ready for tableToCsv / tableToMarkdown. */
export interface AnalysisTables {
  points: Table;
  steps: Table;
  effectiveBarriers: Table;
  energeticSpans: Table;
  /** Each cycle state's degree of TOF control X_TOF (Kozuch & Shaik 2011), TSs then intermediates. */
  tofControl: Table;
  comparisons: Table;
  /** Present only for a report annotated with a Monte Carlo run (N, seed, input σ, probabilities, variance shares). */
  uncertainty?: UncertaintyTables;
}

type Step = ReportPathway['steps'][number];
type Point = ReportPathway['points'][number];
type Barrier = NonNullable<ReportPathway['effectiveBarrier']>;
type Span = NonNullable<ReportPathway['energeticSpan']>;

/** The analysis tables as column specs (shared by the tables export and the report's uncertainty section). */
export interface AnalysisSpecs {
  points: TableSpec<{ p: ReportPathway; pt: Point }>;
  steps: TableSpec<{ p: ReportPathway; s: Step }>;
  effectiveBarriers: TableSpec<{ p: ReportPathway; eb: Barrier }>;
  energeticSpans: TableSpec<{ p: ReportPathway; sp: Span }>;
  tofControl: TableSpec<{ p: ReportPathway; sp: Span; key: string }>;
  comparisons: TableSpec<ReportComparison>;
}

const P_FASTER = 'P(candidate faster) / %';

/**
 * Column specs of the analysis tables: energies in the report's unit rounded to `decimals`,
 * other numbers to 4 significant digits, and where each quantity's Monte Carlo interval sits
 * in an annotated report (`annotateReport`).
 */
export function analysisSpecs(report: AnalysisReport, decimals: number): AnalysisSpecs {
  const u = unitLabel(report.unit);
  const q = report.quantity;
  const e = (v: number | null) => (v === null ? null : round(v, decimals));
  const show = (v: number) => round(v, decimals);
  const energy = <R>(name: string, holder: (r: R) => object | null, field: string): IntervalSpec<R> => ({ name, unit: u, holder, field, show });
  const number = <R>(name: string, unit: string | null, holder: (r: R) => object | null, field: string | ((r: R) => string)): IntervalSpec<R> => ({ name, unit, holder, field, show: (v) => sig(v) ?? v });
  const stepName = (s: Step) => `${s.from} → ${s.ts ?? '(no TS)'} → ${s.to}`;
  const of = <K extends string, V>(key: K, pick: (p: ReportPathway) => V | null) => report.pathways.flatMap((p) => { const v = pick(p); return v ? [{ p, [key]: v } as { p: ReportPathway } & Record<K, V>] : []; });
  const percent = (c: ReportComparison) => {
    const p = c.type === 'rate' ? probabilitiesOf(c as Holder, 'faster') : [];
    return p.length === 0 ? null : round(100 * (p.find(([name]) => name === (c as { candidate: string }).candidate)?.[1] ?? 0), 1);
  };
  const sharesWithIntervals = (c: ReportComparison) => {
    if (c.type === 'rate') return null;
    const parts = c.products.map((p) => {
      const i = (p as Holder).uncertainty?.percent as { median: number; low: number; high: number } | undefined;
      return i ? `${p.pathway} ${i.median.toFixed(1)} [${i.low.toFixed(1)}, ${i.high.toFixed(1)}]` : null;
    });
    return parts.every((x) => x === null) ? null : parts.map((x, k) => x ?? `${c.products[k]!.pathway} —`).join('; ');
  };
  return {
    points: {
      rows: report.pathways.flatMap((p) => p.points.map((pt) => ({ p, pt }))),
      subject: ({ p, pt }) => `${p.name}: ${pt.label}`,
      columns: [
        { title: 'pathway', cell: ({ p }) => p.name },
        { title: 'point', cell: ({ pt }) => pt.label },
        { title: 'kind', cell: ({ pt }) => (pt.kind === 'ts' ? 'TS' : 'minimum') },
        { title: `Δ${q} / ${u}`, cell: ({ pt }) => e(pt.energy), interval: energy(`Δ${q}`, ({ pt }) => pt, 'energy') },
        { title: 'source', cell: ({ pt }) => pt.provenance.detail },
      ],
    },
    steps: {
      rows: report.pathways.flatMap((p) => p.steps.map((s) => ({ p, s }))),
      subject: ({ p, s }) => `${p.name}: ${stepName(s)}`,
      columns: [
        { title: 'pathway', cell: ({ p }) => p.name },
        { title: 'from', cell: ({ s }) => s.from },
        { title: 'TS', cell: ({ s }) => s.ts ?? '(no TS)' },
        { title: 'to', cell: ({ s }) => s.to },
        { title: `Δ${q}‡ forward / ${u}`, cell: ({ s }) => e(s.barrierForward), interval: energy(`Δ${q}‡ forward`, ({ s }) => s, 'barrierForward') },
        { title: `Δ${q}‡ reverse / ${u}`, cell: ({ s }) => e(s.barrierReverse), interval: energy(`Δ${q}‡ reverse`, ({ s }) => s, 'barrierReverse') },
        { title: `Δ${q} step / ${u}`, cell: ({ s }) => e(s.reactionEnergy), interval: energy(`Δ${q} step`, ({ s }) => s, 'reactionEnergy') },
        { title: 'k forward (unit in next column)', cell: ({ s }) => sig(s.kForward) },
        {
          title: 'k forward unit', cell: ({ s }) => s.kForwardUnit,
          interval: { ...number('k forward', null, ({ s }) => s, 'kForward'), unitNote: 'unit in k forward unit', rowUnit: ({ s }) => s.kForwardUnit, estimate: ({ s }) => sig(s.kForward) },
        },
        { title: 'k reverse (unit in next column)', cell: ({ s }) => sig(s.kReverse) },
        {
          title: 'k reverse unit', cell: ({ s }) => s.kReverseUnit,
          interval: { ...number('k reverse', null, ({ s }) => s, 'kReverse'), unitNote: 'unit in k reverse unit', rowUnit: ({ s }) => s.kReverseUnit, estimate: ({ s }) => sig(s.kReverse) },
        },
        { title: 'K (c° = 1 mol L⁻¹)', cell: ({ s }) => sig(s.equilibriumConstant), interval: { ...number('K', null, ({ s }) => s, 'equilibriumConstant'), unitNote: 'c° = 1 mol L⁻¹', rowUnit: () => 'dimensionless' } },
        { title: 't½ forward / s', cell: ({ s }) => sig(s.halfLifeSeconds), interval: number('t½ forward', 's', ({ s }) => s, 'halfLifeSeconds') },
      ],
    },
    effectiveBarriers: {
      rows: of('eb', (p) => p.effectiveBarrier),
      subject: ({ p }) => p.name,
      columns: [
        { title: 'pathway', cell: ({ p }) => p.name },
        { title: `effective barrier Δ${q}‡ / ${u}`, cell: ({ eb }) => e(eb.value), interval: energy(`effective barrier Δ${q}‡`, ({ eb }) => eb, 'value') },
        { title: 'from intermediate', cell: ({ eb }) => eb.intermediate },
        { title: 'to TS', cell: ({ eb }) => eb.ts },
        { title: 't½ / s', cell: ({ eb }) => sig(eb.halfLifeSeconds), interval: number('t½', 's', ({ eb }) => eb, 'halfLifeSeconds') },
        { title: 'reading (common practice)', cell: ({ eb }) => eb.reading },
      ],
    },
    energeticSpans: {
      rows: of('sp', (p) => p.energeticSpan),
      subject: ({ p }) => p.name,
      columns: [
        { title: 'cycle', cell: ({ p }) => p.name },
        { title: `δE / ${u}`, cell: ({ sp }) => e(sp.deltaE), interval: energy('δE', ({ sp }) => sp, 'deltaE') },
        { title: 'TDTS', cell: ({ sp }) => sp.tdts },
        { title: 'TDI', cell: ({ sp }) => sp.tdi },
        { title: 'TOF / s⁻¹', cell: ({ sp }) => sig(sp.tof), interval: number('TOF', 's⁻¹', ({ sp }) => sp, 'tof') },
        { title: 'TOF, δE approximation / s⁻¹', cell: ({ sp }) => sig(sp.tofApprox), interval: number('TOF, δE approximation', 's⁻¹', ({ sp }) => sp, 'tofApprox') },
        { title: `apparent barrier / ${u}`, cell: ({ sp }) => e(sp.apparentBarrier), interval: energy('apparent barrier', ({ sp }) => sp, 'apparentBarrier') },
        { title: `Δ${q}r per turnover / ${u}`, cell: ({ sp }) => e(sp.reactionEnergy), interval: energy(`Δ${q}r per turnover`, ({ sp }) => sp, 'reactionEnergy') },
      ],
    },
    tofControl: {
      rows: of('sp', (p) => p.energeticSpan).flatMap(({ p, sp }) => Object.keys(sp.degreeOfTofControl).map((key) => ({ p, sp, key }))),
      subject: ({ p, key }) => `${p.name}: ${key}`,
      columns: [
        { title: 'cycle', cell: ({ p }) => p.name },
        { title: 'state', cell: ({ key }) => key },
        { title: 'kind', cell: ({ p, key }) => (stateKind(p, key) === 'ts' ? 'TS' : 'intermediate') },
        {
          title: 'X_TOF / %', cell: ({ sp, key }) => sig(100 * sp.degreeOfTofControl[key]!),
          interval: { name: 'X_TOF', unit: '%', holder: ({ sp }) => sp, field: 'degreeOfTofControl', entry: ({ key }) => key, show: (v) => sig(100 * v) ?? 100 * v },
        },
      ],
    },
    comparisons: {
      rows: report.comparisons,
      subject: (c) => (c.type === 'rate' ? `${c.candidate} vs ${c.baseline}` : `selectivity ${c.pathways.join(', ')}`),
      columns: [
        { title: 'comparison', cell: (c) => (c.type === 'rate' ? `rate: ${c.candidate} vs ${c.baseline}` : c.assumption ? 'selectivity (Curtin–Hammett)' : 'selectivity') },
        { title: 'pathways', cell: (c) => (c.type === 'rate' ? `${c.candidate}; ${c.baseline}` : c.pathways.join('; ')) },
        { title: `ΔΔ${q}‡ (baseline − candidate; selectivity: TS gap) / ${u}`, cell: (c) => e(c.ddG), interval: energy(`ΔΔ${q}‡`, (c) => c, 'ddG') },
        {
          title: 'rate or product ratio (dimensionless)', cell: (c) => sig(c.type === 'rate' ? c.rateRatio : c.ratio),
          interval: { ...number('rate or product ratio', null, (c) => c, (c) => (c.type === 'rate' ? 'rateRatio' : 'ratio')), unitNote: 'dimensionless', rowUnit: () => 'dimensionless' },
        },
        { title: 'log₁₀ rate ratio', cell: (c) => (c.type === 'rate' ? sig(c.log10RateRatio) : null), interval: { ...number('log₁₀ rate ratio', null, (c) => (c.type === 'rate' ? c : null), 'log10RateRatio'), rowUnit: () => 'dimensionless' } },
        { title: P_FASTER, cell: percent, uncertainOnly: true },
        { title: 'product shares / %', cell: (c) => (c.type === 'rate' ? null : c.products.map((p) => `${p.pathway} ${p.percent.toFixed(1)}`).join('; ')) },
        { title: 'product shares, median [95 % interval] / %', cell: sharesWithIntervals, uncertainOnly: true },
        {
          title: 'ee / %', cell: (c) => (c.type === 'rate' || c.ee === null ? null : round(100 * c.ee, 1)),
          interval: { name: 'ee toward the major product', unit: '%', holder: (c) => (c.type === 'rate' ? null : c), field: 'ee', show: (v) => round(100 * v, 1) },
        },
      ],
    },
  };
}

/**
 * Tables of an analysis report (display-unit energies, SI rates): points with provenance,
 * steps (barriers, reaction energies, Eyring k with their units, K, half-lives), effective
 * barriers, energetic span results and comparisons. Every header names its unit;
 * rate constants, whose unit depends on molecularity, carry it in the next column.
 * Energies are rounded to `decimals`, other numbers to 4 significant digits. A report
 * annotated with a Monte Carlo run (`annotateReport`) adds the median, 2.5 % and 97.5 %
 * columns beside each quantity that has them, P(candidate faster), product-share intervals,
 * and the run's own tables (N, seed, input σ, probabilities, variance shares).
 */
export function analysisTables(report: AnalysisReport | UncertainReport, decimals: number): AnalysisTables {
  const specs = analysisSpecs(report, decimals);
  const uncertain = 'uncertainty' in report;
  const tables: AnalysisTables = {
    points: buildTable(specs.points, uncertain),
    steps: buildTable(specs.steps, uncertain),
    effectiveBarriers: buildTable(specs.effectiveBarriers, uncertain),
    energeticSpans: buildTable(specs.energeticSpans, uncertain),
    tofControl: buildTable(specs.tofControl, uncertain),
    comparisons: buildTable(specs.comparisons, uncertain),
  };
  if (uncertain) tables.uncertainty = uncertaintyTables(report);
  return tables;
}

/** A cycle state's kind from its X_TOF key: its label, or "label (id)" where the label repeats. */
function stateKind(p: ReportPathway, key: string): 'min' | 'ts' | undefined {
  return (p.points.find((pt) => pt.label === key) ?? p.points.find((pt) => key.startsWith(`${pt.label} (`)))?.kind;
}

function round(value: number, decimals: number): number {
  const r = Number(value.toFixed(decimals));
  return Object.is(r, -0) ? 0 : r;
}

