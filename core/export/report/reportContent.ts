import type { DocumentAnalysis } from '../../analysis/analyseDocument.ts';
import type { Scene } from '../../figure/scene.ts';
import type { Document } from '../../model/schema.ts';
import type { AnalysisReport } from '../../report/analysisReport.ts';
import { formatTableNumber, roundSignificant } from '../../format/tableNumber.ts';
import { unitLabel } from '../../units/energy.ts';
import { analysisTables } from '../analysisTables.ts';
import type { Table } from '../tables.ts';
import { CAUTION, METHODS } from './methodsText.ts';
import type { ReportPages } from './reportPages.ts';
import { energyDecimals } from '../../format/energyDecimals.ts';
import { reportCell } from './reportCell.ts';
import { errorBarCaption, uncertaintySection } from './uncertaintySection.ts';
import type { UncertainReport } from '../../uncertainty/annotateReport.ts';

const STANDARD_STATES: Record<Document['settings']['standardState'], string> = {
  'as-computed': 'as computed (no correction)',
  '1atm-to-1M': '1 atm → 1 mol L⁻¹ per solute species',
  '1bar-to-1M': '1 bar → 1 mol L⁻¹ per solute species',
};

/**
 * Writes the report's sections onto `pages`: figure, settings, tables, methods, findings,
 * caution; with `uncertain` (the report annotated with a Monte Carlo run) an uncertainty
 * section after the comparisons, and a line under the figure when it carries error bars.
 */
export function reportContent(pages: ReportPages, doc: Document, analysis: DocumentAnalysis, report: AnalysisReport, scene: Scene, uncertain?: UncertainReport): void {
  const s = doc.settings;
  const unit = unitLabel(report.unit);
  const tables = analysisTables(report, energyDecimals(s, s.unit));
  pages.heading(doc.title || 'Energy profile', 1.7);
  pages.paragraph(`Passline report: Δ${report.quantity} in ${unit} at ${report.temperatureK} K.`);
  pages.figure(scene);
  if (uncertain && doc.figure.errorBars && scene.items.some((i) => i.role === 'errorBar')) pages.paragraph(errorBarCaption(uncertain, doc.figure.errorBars), 0.9);
  pages.heading('Settings');
  pages.table(['setting', 'value'], [
    ['quantity', `Δ${s.quantity} (${{ E: 'electronic energy', H: 'enthalpy', G: 'Gibbs energy' }[s.quantity]})`],
    ['temperature', `${s.temperatureK} K`],
    ['standard state', STANDARD_STATES[s.standardState]],
    ['energy unit', unit],
    ['transmission coefficient κ', String(s.transmission)],
    ['reference state', s.reference.kind === 'point' ? `${s.reference.point} of ${s.reference.pathway}` : { first: 'first point of each pathway', zero: 'one document-wide zero (typed values as typed)', species: 'a sum of species shared by all pathways' }[s.reference.kind]],
  ]);
  section(pages, 'Energies and where they come from', tables.points);
  section(pages, 'Steps', stepsForPage(report, energyDecimals(s, s.unit)), 'Rate constants from the Eyring equation with their units; t½ is the first-order half-life of the forward step.');
  section(pages, 'Effective barriers', tables.effectiveBarriers);
  section(pages, 'Energetic span of catalytic cycles', tables.energeticSpans, report.pathways.some((p) => p.energeticSpan) ? `Convention: ${report.pathways.find((p) => p.energeticSpan)!.energeticSpan!.convention}.` : undefined);
  if (tables.tofControl.rows.length > 0) section(pages, 'Degree of TOF control', tables.tofControl, "X_TOF of each cycle state: the share of the TOF's sensitivity to that state's energy (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011)); in each cycle the TSs' shares add up to 100 %, and so do the intermediates'.");
  section(pages, 'Comparisons', tables.comparisons);
  if (uncertain) uncertaintySection(pages, uncertain, energyDecimals(s, s.unit));
  pages.heading('Methods');
  for (const m of METHODS) pages.paragraph(m);
  const findings = analysis.findings.length === 0 ? ['No findings.']
    : analysis.findings.map((f) => `${f.severity} [${f.code}] ${f.message}${f.pathway ? ` (${f.pathway}${f.point ? ` / ${f.point}` : ''})` : ''}`);
  // The closing sections travel together when they fit on one page, so no page holds only the caution.
  pages.keepTogether([{ heading: 'Findings', paragraphs: findings }, { heading: 'Caution', paragraphs: [CAUTION] }]);
  pages.heading('Findings');
  for (const f of findings) pages.paragraph(f);
  pages.heading('Caution');
  pages.paragraph(CAUTION);
}

function section(pages: ReportPages, title: string, table: Table, note?: string): void {
  pages.heading(title);
  if (table.rows.length === 0) {
    pages.paragraph('None in this document.');
    return;
  }
  if (note) pages.paragraph(note, 0.9);
  pages.table(table.columns, table.rows.map((r) => r.map(reportCell)));
}

/** The steps table with each rate constant and its unit in one cell, so it fits a portrait page. */
function stepsForPage(report: AnalysisReport, decimals: number): Table {
  const u = unitLabel(report.unit);
  const q = report.quantity;
  const en = (v: number | null) => (v === null ? null : Number(v.toFixed(decimals)));
  const k = (v: number | null, unit: string) => (v === null ? '—' : `${sci(v)} ${unit}`);
  return {
    columns: ['pathway', 'step', `Δ${q}‡ forward / ${u}`, `Δ${q}‡ reverse / ${u}`, `Δ${q} step / ${u}`, 'k forward', 'k reverse', 't½ / s'],
    rows: report.pathways.flatMap((p) => p.steps.map((st) => [
      p.name, `${st.from} → ${st.ts ?? '(no TS)'} → ${st.to}`, en(st.barrierForward), en(st.barrierReverse), en(st.reactionEnergy),
      k(st.kForward, st.kForwardUnit), k(st.kReverse, st.kReverseUnit), st.halfLifeSeconds === null ? null : sci(st.halfLifeSeconds),
    ])),
  };
}

/** k and t½ in the notation of every other table (the uncertainty section's k reads the same). */
function sci(v: number): string {
  return formatTableNumber(roundSignificant(v)!);
}
