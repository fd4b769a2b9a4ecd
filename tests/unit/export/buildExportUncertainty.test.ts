// ui/export/buildExport.ts is plain TypeScript; its test runs under Node, where the font fixture can be read.
import { describe, expect, it } from 'vitest';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { buildExport } from '../../../ui/export/buildExport.ts';
import { fontBytes, fontMetrics } from '../figure/fontFixture.ts';
import { typed } from '../profile/builders.ts';

// Invented: R 0, TS barrier 18 ± 1.5 kcal/mol, P −4.
const doc = makeDocument({ title: 'x', pathways: [{ id: 'a', name: 'A', points: [typed('R', 'min', 0), typed('TS', 'ts', 18, { energy: { mode: 'barrier', value: 18, unit: 'kcal/mol', sigma: 1.5 } }), typed('P', 'min', -4)] }] });
const analysis = analyseDocument(doc);
const font = { metrics: fontMetrics(), bytes: fontBytes };
const base = { preset: 'double', theme: 'colour', dpi: 300 } as const;
const run = analyseUncertainty(doc, { samples: 1000, seed: 6 });

describe('buildExport with the app\'s finished Monte Carlo run', () => {
  it('puts the run into the analysis tables (N, seed, σ and the interval columns), and leaves them as they were without one', async () => {
    const md = (await buildExport(doc, analysis, font, { ...base, kind: 'analysis-md', uncertainty: run })).data as string;
    expect(md).toContain('N = 1000 samples, seed 6');
    expect(md).toContain('TS (A): barrier 1.5 kcal mol⁻¹');
    expect(md).toContain('ΔG‡ forward, 2.5 % / kcal mol⁻¹');
    const plain = (await buildExport(doc, analysis, font, { ...base, kind: 'analysis-csv' })).data as string;
    expect(plain).not.toMatch(/median|Uncertainty/);
  });

  it('puts the uncertainty section into the report', { timeout: 30_000 }, async () => {
    const pdf = (await buildExport(doc, analysis, font, { ...base, kind: 'report', uncertainty: run })).data as Uint8Array;
    const reader = await getDocument({ data: pdf.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
    let text = '';
    for (let n = 1; n <= reader.numPages; n++) text += (await (await reader.getPage(n)).getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join(' ');
    expect(text.replace(/\s+/g, ' ')).toContain('N = 1000 samples, seed 6');
  });
});
