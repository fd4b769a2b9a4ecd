import { jsPDF } from 'jspdf';
import { analyseDocument } from '../analysis/analyseDocument.ts';
import { drawScene } from '../figure/drawScene.ts';
import { readFontMetrics } from '../figure/font/fontMetrics.ts';
import { layoutFigure } from '../figure/layoutFigure.ts';
import type { Preset } from '../figure/presets.ts';
import { MM_PER_PT } from '../figure/scene.ts';
import type { ThemeName } from '../figure/themes.ts';
import type { Document } from '../model/schema.ts';
import { analysisReport } from '../report/analysisReport.ts';
import { offsetSink } from './offsetSink.ts';
import { pdfSink } from './pdfSink.ts';
import { reportContent } from './report/reportContent.ts';
import { A4, ReportPages, type PageOp } from './report/reportPages.ts';
import type { FontSubsetter } from './sceneToPdf.ts';
import { sceneText } from './sceneText.ts';
import { toBase64 } from './toBase64.ts';
import { safeText } from '../format/safeText.ts';
import { annotateReport } from '../uncertainty/annotateReport.ts';
import { errorBarRanges } from '../uncertainty/errorBarRanges.ts';
import type { UncertaintyResult } from '../uncertainty/uncertaintyRun.ts';

/** Report choices; the figure follows the document's settings unless overridden. */
export interface ReportOptions {
  /** The TrueType font to measure with and embed (DejaVu Sans from assets/fonts). */
  fontBytes: Uint8Array;
  /** When given, only the glyphs the report uses are embedded. */
  subsetFont?: FontSubsetter;
  preset?: Preset;
  theme?: ThemeName;
  autoSubscript?: boolean;
  /**
   * A finished Monte Carlo run of this document (core/uncertainty): adds the uncertainty
   * section, and the figure's error bars when `doc.figure.errorBars` asks for them.
   */
  uncertainty?: UncertaintyResult | undefined;
}

/**
 * A multi-page A4 PDF report of a document: the figure (vector, the same scene as every
 * export) on page 1, then settings, energies with provenance, steps, effective barriers,
 * energetic span results, comparisons, the Monte Carlo intervals when a run is given,
 * methods with their sources, findings and the safety caution. Text wraps within the page and tables break across pages. Pure: the
 * caller supplies the font (and, in Node, a subsetter; see renderReport.node.ts).
 */
export async function renderReport(doc: Document, options: ReportOptions): Promise<Uint8Array> {
  const metrics = readFontMetrics(options.fontBytes);
  const analysis = analyseDocument(doc);
  const report = analysisReport(doc, analysis);
  const run = options.uncertainty;
  const bars = run && doc.figure.errorBars ? errorBarRanges(run, doc.figure.errorBars) : undefined;
  const scene = layoutFigure(analysis.profile, doc, {
    metrics, preset: options.preset ?? 'double', widthMm: A4.widthMm - 2 * A4.marginMm,
    ...(options.theme ? { theme: options.theme } : {}),
    ...(options.autoSubscript !== undefined ? { autoSubscript: options.autoSubscript } : {}),
    ...(bars ? { errorBars: bars } : {}),
  });
  const pages = new ReportPages(metrics);
  reportContent(pages, doc, analysis, report, scene, run && annotateReport(report, run));
  const font = options.subsetFont ? await options.subsetFont(options.fontBytes, usedText(pages.pages, sceneText(scene))) : options.fontBytes;
  const pdf = new jsPDF({ unit: 'mm', format: 'a4', orientation: 'portrait', compress: true, putOnlyUsedFonts: true });
  pdf.addFileToVFS('report-font.ttf', toBase64(font));
  pdf.addFont('report-font.ttf', metrics.family, 'normal', 'Identity-H');
  pdf.setFont(metrics.family, 'normal');
  pdf.setProperties({ title: safeText(doc.title) || 'Energy profile report', creator: 'Passline' });
  pages.pages.forEach((ops, i) => {
    if (i > 0) pdf.addPage('a4', 'portrait');
    for (const op of ops) drawOp(pdf, op);
  });
  return new Uint8Array(pdf.output('arraybuffer'));
}

function drawOp(pdf: jsPDF, op: PageOp): void {
  if (op.op === 'scene') return drawScene(op.scene, offsetSink(pdfSink(pdf), op.x, op.y));
  if (op.op === 'rule') {
    pdf.setDrawColor('#666666');
    pdf.setLineWidth(op.widthMm);
    pdf.setLineDashPattern([], 0);
    pdf.line(op.x1, op.y1, op.x2, op.y2);
    return;
  }
  pdf.setTextColor(op.colour);
  pdf.setFontSize(op.sizeMm / MM_PER_PT);
  pdf.text(safeText(op.text), op.x, op.y, { baseline: 'alphabetic' });
}

function usedText(pages: readonly PageOp[][], figure: string): string {
  const chars = new Set(figure);
  for (const ops of pages) for (const op of ops) if (op.op === 'text') for (const c of safeText(op.text)) chars.add(c);
  return [...chars].sort().join('');
}
