import { describe, expect, it } from 'vitest';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { renderReport } from '../../../core/export/renderReport.node.ts';
import { A4, ReportPages } from '../../../core/export/report/reportPages.ts';
import { measureText } from '../../../core/figure/font/measureText.ts';
import { fontBytes, fontMetrics } from '../figure/fontFixture.ts';
import { analysedDocument } from './analysisFixture.ts';
import { listPdfFonts, pdffontsEmbedded } from './pdfFonts.ts';

async function pagesOf(bytes: Uint8Array) {
  // pdf.js (Mozilla's reader) parses the bytes independently of jsPDF.
  const pdf = await getDocument({ data: bytes.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  const out: { text: string; ops: number[] }[] = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    const content = await page.getTextContent();
    out.push({ text: content.items.map((i) => ('str' in i ? i.str : '')).join('\n'), ops: (await page.getOperatorList()).fnArray });
  }
  return out;
}

describe('renderReport', () => {
  it('prints the figure first, then every section, numbers with units, methods and the caution', { timeout: 30_000 }, async () => {
    const { doc } = analysedDocument();
    const pages = await pagesOf(await renderReport(doc, { fontBytes }));
    expect(pages.length).toBeGreaterThan(1);
    // Page 1 holds the figure: its axis title and arrow words are there as text.
    expect(pages[0]!.text).toContain('ΔG / kcal mol⁻¹');
    expect(pages[0]!.text).toContain('Reaction coordinate');
    const all = pages.map((p) => p.text).join('\n').replace(/\s+/g, ' ');
    for (const s of ['Settings', 'Energies and where they come from', 'Steps', 'Effective barriers', 'Energetic span of catalytic cycles', 'Comparisons', 'Methods', 'Findings', 'Caution']) {
      expect(all, s).toContain(s);
    }
    // REFERENCE.md §6 cycle A (Kozuch & Shaik ACR 2011): δE 22.5 kcal/mol, k⁺₁ 9.94e3 s⁻¹, TOF 1.664e-4 s⁻¹.
    expect(all).toContain('δE /');
    expect(all).toContain('kcal mol⁻¹');
    expect(all).toContain('22.5');
    // k⁺₁ is printed to the tables' 4 significant figures; it must round to the reference's 9.94 × 10³.
    expect(all).toMatch(/ 99(3[5-9]|4[0-4]) s⁻¹/);
    expect(all).toContain('1.664 × 10⁻⁴');
    expect(all).toContain('298.15 K');
    for (const source of ['Eyring', 'Evans & Polanyi', 'Kozuch & Shaik', 'Marcus', 'Bell', 'Curtin–Hammett', 'CODATA 2018', 'Ben-Naim & Marcus']) expect(all, source).toContain(source);
    expect(all).toMatch(/not a process-safety assessment/);
    expect(all).toMatch(/calorimetry/);
  });

  it('is vector only: paths and text, no raster image', async () => {
    const { doc } = analysedDocument();
    const bytes = await renderReport(doc, { fontBytes });
    const pages = await pagesOf(bytes);
    expect(pages[0]!.ops).toContain(OPS.constructPath);
    for (const p of pages) {
      expect(p.ops).not.toContain(OPS.paintImageXObject);
      expect(p.ops).not.toContain(OPS.paintInlineImageXObject);
    }
    expect(new TextDecoder('latin1').decode(bytes)).not.toMatch(/\/Subtype\s*\/Image/);
  });

  it('writes every number in one notation, × 10ⁿ, and keeps notes for developers out of the reader\'s text', async () => {
    const { doc } = analysedDocument();
    const pages = await pagesOf(await renderReport(doc, { fontBytes }));
    const all = pages.map((p) => p.text).join('\n').replace(/\s+/g, ' ');
    // No e-notation ("2.772e5", "1.39e+4", "8.761e−4") and no long runs of leading zeros ("0.00000250").
    expect(all).not.toMatch(/\d[eE][+\-−]?\d/);
    expect(all).not.toMatch(/0\.0000/);
    expect(all).not.toMatch(/from memory/i);
    expect(all).toContain('How the numbers in this report were obtained');
  });

  it('ends on a page that holds more than a trailing paragraph', async () => {
    const { doc } = analysedDocument();
    const pages = await pagesOf(await renderReport(doc, { fontBytes }));
    const last = pages[pages.length - 1]!.text;
    expect(last).toContain('Findings');
    expect(last).toContain('Caution');
  });

  it('lists only embedded fonts', async () => {
    const { doc } = analysedDocument();
    const bytes = await renderReport(doc, { fontBytes });
    const fonts = listPdfFonts(bytes);
    expect(fonts.length).toBeGreaterThan(0);
    expect(fonts.filter((f) => !f.embedded)).toEqual([]);
    const poppler = pdffontsEmbedded(bytes);
    if (poppler) expect(poppler.every(Boolean)).toBe(true);
  });
});

describe('ReportPages', () => {
  const metrics = fontMetrics();
  const right = A4.widthMm - A4.marginMm;

  it('wraps text within the page and breaks a long table across pages with its header repeated', () => {
    const pages = new ReportPages(metrics);
    pages.paragraph('word '.repeat(400) + 'averyveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryveryverylongword');
    pages.table(['state', 'energy / kcal mol⁻¹', 'source'], Array.from({ length: 150 }, (_, i) => [`S${i}`, String(i), 'typed relative value '.repeat(3)]));
    expect(pages.pages.length).toBeGreaterThan(2);
    for (const ops of pages.pages) {
      for (const op of ops) {
        if (op.op !== 'text') continue;
        expect(op.x + measureText(metrics, op.text, op.sizeMm)).toBeLessThanOrEqual(right + 1e-9);
        expect(op.y).toBeLessThanOrEqual(A4.heightMm - A4.marginMm + 1e-9);
      }
    }
    const headers = pages.pages.map((ops) => ops.some((op) => op.op === 'text' && op.text === 'state'));
    expect(headers.slice(1).every(Boolean)).toBe(true);
  });

  it('moves a paragraph that would leave one line alone to the next page', () => {
    const pages = new ReportPages(metrics);
    const line = 'word '.repeat(18).trim();
    // Fill the first page to two lines short of its foot, then write a three-line paragraph.
    while (pages.pages.length === 1) pages.paragraph(line);
    const before = new ReportPages(metrics);
    for (let k = 0; k < 200; k++) before.paragraph(line);
    for (const p of before.pages.slice(0, -1)) {
      const texts = p.filter((op) => op.op === 'text');
      expect(texts.length).toBeGreaterThan(1);
    }
    const split = new ReportPages(metrics);
    const three = `${line} ${line} ${line}`;
    for (let k = 0; k < 400 && split.pages.length < 3; k++) split.paragraph(k % 3 ? line : three);
    // No page begins with the lone last line of a paragraph begun on the page before.
    for (const p of split.pages.slice(1)) expect(p.filter((op) => op.op === 'text').length).toBeGreaterThan(1);
  });
});
