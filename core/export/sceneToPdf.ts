import { jsPDF } from 'jspdf';
import { drawScene } from '../figure/drawScene.ts';
import type { Scene } from '../figure/scene.ts';
import { pdfSink } from './pdfSink.ts';
import { sceneText } from './sceneText.ts';
import { toBase64 } from './toBase64.ts';
import { safeText } from '../format/safeText.ts';

/** Cuts a TrueType font down to the glyphs of `text` (e.g. subsetFont.node.ts, HarfBuzz in Node). */
export type FontSubsetter = (font: Uint8Array, text: string) => Promise<Uint8Array>;

/** PDF output choices. */
export interface PdfOptions {
  /** The TrueType font the scene was measured with; it is embedded. */
  fontBytes: Uint8Array;
  /** When given, only the glyphs the figure uses are embedded. */
  subsetFont?: FontSubsetter;
  title?: string;
}

/**
 * The scene as a one-page vector PDF (jsPDF): page size = figure size in mm, orientation
 * passed to match the page's shape (jsPDF otherwise swaps width and height), paths as
 * path operators, text as text in the embedded TrueType font so Δ, ‡, ⁻¹ and ° print.
 */
export async function sceneToPdf(scene: Scene, options: PdfOptions): Promise<Uint8Array> {
  const { widthMm: w, heightMm: h } = scene;
  const pdf = new jsPDF({ unit: 'mm', format: [w, h], orientation: w > h ? 'landscape' : 'portrait', compress: true, putOnlyUsedFonts: true });
  const font = options.subsetFont ? await options.subsetFont(options.fontBytes, sceneText(scene)) : options.fontBytes;
  const file = 'figure-font.ttf';
  pdf.addFileToVFS(file, toBase64(font));
  pdf.addFont(file, scene.fontFamily, 'normal', 'Identity-H');
  pdf.setFont(scene.fontFamily, 'normal');
  pdf.setProperties({ title: safeText(options.title ?? 'Energy profile'), creator: 'Passline' });
  drawScene(scene, pdfSink(pdf));
  return new Uint8Array(pdf.output('arraybuffer'));
}
