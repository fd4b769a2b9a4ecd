import type { Document } from '../model/schema.ts';
import { renderReport as renderPure, type ReportOptions } from './renderReport.ts';
import { subsetFontNode } from './subsetFont.node.ts';

/** renderReport for Node (the CLI): the embedded font is subset to the glyphs used. */
export function renderReport(doc: Document, options: ReportOptions): Promise<Uint8Array> {
  return renderPure(doc, { subsetFont: subsetFontNode, ...options });
}
