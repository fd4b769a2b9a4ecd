import type { FontMetrics } from '../../figure/font/fontMetrics.ts';
import { measureText } from '../../figure/font/measureText.ts';
import { MM_PER_PT, type Scene } from '../../figure/scene.ts';
import { wrapText } from './wrapText.ts';

/** One thing drawn on a report page, in mm from the page's top left. */
export type PageOp =
  | { op: 'text'; text: string; x: number; y: number; sizeMm: number; colour: string }
  | { op: 'rule'; x1: number; y1: number; x2: number; y2: number; widthMm: number }
  | { op: 'scene'; scene: Scene; x: number; y: number };

/** Page geometry of a report (A4 portrait by default, ISO 216: 210 × 297 mm). */
export interface PageSetup {
  widthMm: number;
  heightMm: number;
  marginMm: number;
  /** Body text size in pt. */
  bodyPt: number;
}

export const A4: PageSetup = { widthMm: 210, heightMm: 297, marginMm: 18, bodyPt: 9 };

const INK = '#1A1A1A';

/** Heading size in body sizes (our choice). */
const HEADING_SCALE = 1.35;

/**
 * Flows report content down pages: headings, wrapped paragraphs, figures and tables.
 * A block that does not fit on the page starts a new one; table rows break across pages
 * with the header repeated.
 */
export class ReportPages {
  readonly pages: PageOp[][] = [[]];
  private y: number;
  private readonly body: number;
  constructor(private readonly metrics: FontMetrics, private readonly setup: PageSetup = A4) {
    this.y = setup.marginMm;
    this.body = setup.bodyPt * MM_PER_PT;
  }

  private get width(): number { return this.setup.widthMm - 2 * this.setup.marginMm; }
  private get bottom(): number { return this.setup.heightMm - this.setup.marginMm; }
  private get page(): PageOp[] { return this.pages[this.pages.length - 1]!; }
  private line(sizeMm: number): number { return (this.metrics.ascent + this.metrics.descent) * sizeMm * 1.15; }

  /** Starts a new page unless `height` mm still fit on this one. */
  ensure(height: number): void {
    if (this.y + height <= this.bottom || this.y === this.setup.marginMm) return;
    this.pages.push([]);
    this.y = this.setup.marginMm;
  }

  heading(text: string, scale = HEADING_SCALE): void {
    const size = this.body * scale;
    this.ensure(this.line(size) * 3);
    this.y += this.line(size) * 0.6;
    for (const l of wrapText(text, this.metrics, size, this.width)) this.write(l, this.setup.marginMm, size);
    this.y += this.line(size) * 0.2;
  }

  /**
   * A wrapped paragraph. One that would leave a single line at the top of the next page
   * (or a single line at the foot of this one) starts on the next page instead, when it fits there.
   */
  paragraph(text: string, scale = 1): void {
    const size = this.body * scale;
    const lines = wrapText(text, this.metrics, size, this.width);
    const fit = Math.floor((this.bottom - this.y) / this.line(size));
    if (fit < lines.length && (lines.length - fit < 2 || fit < 2)) this.ensure(Math.min(this.paragraphHeight(lines.length, size), this.bottom - this.setup.marginMm));
    for (const l of lines) {
      this.ensure(this.line(size));
      this.write(l, this.setup.marginMm, size);
    }
    this.y += this.line(size) * 0.35;
  }

  /** Starts a new page unless these sections (heading and paragraphs each) fit on this one; nothing when they would not fit on any page. */
  keepTogether(sections: readonly { heading: string; paragraphs: readonly string[] }[]): void {
    const body = this.body;
    const head = this.body * HEADING_SCALE;
    let height = 0;
    for (const s of sections) {
      height += this.line(head) * (0.8 + wrapText(s.heading, this.metrics, head, this.width).length);
      for (const p of s.paragraphs) height += this.paragraphHeight(wrapText(p, this.metrics, body, this.width).length, body);
    }
    if (height <= this.bottom - this.setup.marginMm) this.ensure(height);
  }

  private paragraphHeight(lines: number, size: number): number {
    return this.line(size) * (lines + 0.35);
  }

  figure(scene: Scene): void {
    this.ensure(scene.heightMm);
    this.page.push({ op: 'scene', scene, x: this.setup.marginMm + (this.width - scene.widthMm) / 2, y: this.y });
    this.y += scene.heightMm + this.line(this.body) * 0.5;
  }

  /** A table: columns share the width by their content; cells wrap; rows never split. */
  table(columns: readonly string[], rows: readonly (readonly string[])[], scale = 0.85): void {
    const size = this.body * scale;
    const pad = 0.8;
    const widths = columnWidths(columns, rows, (t) => measureText(this.metrics, t, size) + 2 * pad, this.width);
    const lh = this.line(size);
    const wrapRow = (cells: readonly string[]) => cells.map((c, i) => wrapText(c, this.metrics, size, widths[i]! - 2 * pad));
    const header = wrapRow(columns);
    const drawRow = (cells: string[][], bold: boolean) => {
      const h = Math.max(...cells.map((c) => c.length)) * lh + pad;
      let x = this.setup.marginMm;
      cells.forEach((lines, i) => {
        lines.forEach((l, k) => this.page.push({ op: 'text', text: l, x: x + pad, y: this.y + (k + 0.8) * lh, sizeMm: size, colour: bold ? '#000000' : INK }));
        x += widths[i]!;
      });
      this.y += h;
      this.rule(bold ? 0.3 : 0.1);
    };
    const rowHeight = (cells: string[][]) => Math.max(...cells.map((c) => c.length)) * lh + pad;
    this.ensure(rowHeight(header) + (rows[0] ? rowHeight(wrapRow(rows[0])) : 0) + 1);
    this.rule(0.3);
    drawRow(header, true);
    for (const row of rows) {
      const cells = wrapRow(row);
      if (this.y + rowHeight(cells) > this.bottom) {
        this.pages.push([]);
        this.y = this.setup.marginMm;
        this.rule(0.3);
        drawRow(header, true);
      }
      drawRow(cells, false);
    }
    this.y += lh * 0.6;
  }

  private rule(widthMm: number): void {
    this.page.push({ op: 'rule', x1: this.setup.marginMm, y1: this.y, x2: this.setup.marginMm + this.width, y2: this.y, widthMm });
  }

  private write(text: string, x: number, size: number): void {
    this.page.push({ op: 'text', text, x, y: this.y + this.metrics.ascent * size, sizeMm: size, colour: INK });
    this.y += this.line(size);
  }
}

/**
 * Column widths: every column gets its natural (unwrapped) width when all fit; otherwise
 * narrow columns keep theirs and the rest share what is left in proportion to their
 * natural widths (a simple greedy rule of ours).
 */
export function columnWidths(columns: readonly string[], rows: readonly (readonly string[])[], measure: (t: string) => number, total: number): number[] {
  const natural = columns.map((c, i) => Math.max(measure(longestWord(c)) , ...rows.map((r) => measure(r[i] ?? '')), measure(c) * 0.5));
  if (natural.reduce((a, b) => a + b, 0) <= total) return natural;
  const fair = total / columns.length;
  const narrow = natural.map((w) => w <= fair);
  const fixed = natural.reduce((s, w, i) => s + (narrow[i] ? w : 0), 0);
  const wideSum = natural.reduce((s, w, i) => s + (narrow[i] ? 0 : w), 0);
  return natural.map((w, i) => (narrow[i] ? w : ((total - fixed) * w) / wideSum));
}

function longestWord(text: string): string {
  return text.split(' ').reduce((a, b) => (b.length > a.length ? b : a), '');
}
