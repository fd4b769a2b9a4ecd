import type { Document } from '../../core/model/schema.ts';
import type { DocumentAnalysis } from '../../core/analysis/analyseDocument.ts';
import type { PointDrawing } from '../../core/structure/pointDepictions.ts';
import type { FontMetrics } from '../../core/figure/font/fontMetrics.ts';
import { layoutFigure } from '../../core/figure/layoutFigure.ts';
import type { ErrorBarRanges } from '../../core/figure/errorBars.ts';
import type { Preset } from '../../core/figure/presets.ts';
import type { ThemeName } from '../../core/figure/themes.ts';
import { sceneToSvg } from '../../core/export/sceneToSvg.ts';
import { sceneToPdf } from '../../core/export/sceneToPdf.ts';
import { pointsTable, tableToCsv, tableToMarkdown } from '../../core/export/tables.ts';
import { analysisReport } from '../../core/report/analysisReport.ts';
import type { ExportMimeType } from '../host/hostApi.ts';
import { analysisTables } from '../../core/export/analysisTables.ts';
import { tablesToCsv, tablesToMarkdown } from '../../core/export/tablesDocument.ts';
import { renderReport } from '../../core/export/renderReport.ts';
import { svgToPng } from './svgToPng.ts';
import { energyDecimals } from '../../core/format/energyDecimals.ts';
import { annotateReport } from '../../core/uncertainty/annotateReport.ts';
import type { UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';

/** What can be exported from the editor. */
export type ExportKind = 'svg' | 'pdf' | 'png' | 'report' | 'points-csv' | 'points-md' | 'analysis-csv' | 'analysis-md';

/** Export choices: figure size preset, theme and PNG resolution. */
export interface ExportChoice {
  kind: ExportKind; preset: Preset; theme: ThemeName; dpi: number;
  /** Error bars on the levels (issue 18). */
  errorBars?: ErrorBarRanges | undefined;
  /** The document's finished Monte Carlo run: intervals in the analysis tables and the report (issue 18). */
  uncertainty?: UncertaintyResult | undefined;
}

/** The file to hand to the host, and a preview: SVG text for figures, the text itself for tables. */
export interface ExportFile { data: string | Uint8Array; mimeType: ExportMimeType; extension: string; preview: { svg?: string; text?: string } }

/** Figure font: its metrics lay the scene out; its bytes are embedded in PDF and PNG. */
export interface ExportFont { metrics: FontMetrics; bytes: Uint8Array }

/** Lays the figure out with the chosen preset and theme (the same scene the canvas draws) and writes the chosen format. */
export async function buildExport(doc: Document, analysis: DocumentAnalysis, font: ExportFont, choice: ExportChoice, render = true, structures?: ReadonlyMap<string, PointDrawing>): Promise<ExportFile> {
  const figure = () => layoutFigure(analysis.profile, doc, {
    metrics: font.metrics, preset: choice.preset, theme: choice.theme,
    ...(structures ? { structures } : {}), ...(choice.errorBars ? { errorBars: choice.errorBars } : {}),
  });
  const tables = () => {
    const report = analysisReport(doc, analysis);
    return analysisTables(choice.uncertainty ? annotateReport(report, choice.uncertainty) : report, energyDecimals(doc.settings, doc.settings.unit));
  };
  switch (choice.kind) {
    case 'svg': { const svg = sceneToSvg(figure()); return { data: svg, mimeType: 'image/svg+xml', extension: '.svg', preview: { svg } }; }
    case 'pdf': {
      const scene = figure();
      const svg = sceneToSvg(scene);
      const data = render ? await sceneToPdf(scene, { fontBytes: font.bytes, title: doc.title || 'Energy profile' }) : new Uint8Array();
      return { data, mimeType: 'application/pdf', extension: '.pdf', preview: { svg } };
    }
    case 'png': {
      const scene = figure();
      const svg = sceneToSvg(scene);
      // The raster needs the font inside the SVG: an image cannot see the page's fonts.
      const data = render ? await svgToPng(sceneToSvg(scene, { embedFont: font.bytes }), scene.widthMm, scene.heightMm, choice.dpi) : new Uint8Array();
      return { data, mimeType: 'image/png', extension: '.png', preview: { svg } };
    }
    case 'report': {
      const svg = sceneToSvg(figure());
      const data = render ? await renderReport(doc, { fontBytes: font.bytes, preset: choice.preset, theme: choice.theme, uncertainty: choice.uncertainty }) : new Uint8Array();
      return { data, mimeType: 'application/pdf', extension: '.pdf', preview: { svg } };
    }
    case 'points-csv': { const text = tableToCsv(pointsTable(analysis.profile, energyDecimals(doc.settings, doc.settings.unit))); return { data: text, mimeType: 'text/csv', extension: '.csv', preview: { text } }; }
    case 'points-md': { const text = tableToMarkdown(pointsTable(analysis.profile, energyDecimals(doc.settings, doc.settings.unit))); return { data: text, mimeType: 'text/markdown', extension: '.md', preview: { text } }; }
    case 'analysis-csv': { const text = tablesToCsv(tables()); return { data: text, mimeType: 'text/csv', extension: '.csv', preview: { text } }; }
    case 'analysis-md': { const text = tablesToMarkdown(tables(), doc.title || 'Energy profile'); return { data: text, mimeType: 'text/markdown', extension: '.md', preview: { text } }; }
  }
}
