import { describe, expect, it } from 'vitest';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { renderReport } from '../../../core/export/renderReport.node.ts';
import { reportCell } from '../../../core/export/report/reportCell.ts';
import { makeDocument } from '../../../core/model/load.ts';
import type { DocumentInput } from '../../../core/model/schema.ts';
import { analyseUncertainty } from '../../../core/uncertainty/uncertaintyRun.ts';
import { rtJoules } from '../../../core/units/thermal.ts';
import { fontBytes } from '../figure/fontFixture.ts';
import { typed } from '../profile/builders.ts';
import { analysedDocument } from './analysisFixture.ts';

async function pagesOf(bytes: Uint8Array) {
  // pdf.js (Mozilla's reader) parses the bytes independently of jsPDF.
  const pdf = await getDocument({ data: bytes.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  const out: { text: string; paths: number }[] = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    const content = await page.getTextContent();
    out.push({ text: content.items.map((i) => ('str' in i ? i.str : '')).join(' ').replace(/\s+/g, ' '), paths: (await page.getOperatorList()).fnArray.filter((f) => f === OPS.constructPath).length });
  }
  return out;
}

// Invented: R 0, TS barrier 20 ± 1 kcal/mol, P −5.
const oneBarrier = (figure: DocumentInput['figure'] = {}) => makeDocument({
  title: 'one uncertain barrier', figure,
  pathways: [{ id: 'a', name: 'A', points: [typed('R', 'min', 0), typed('TS', 'ts', 20, { energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -5)] }],
});

// Two-sided 95 % quantile of the standard normal, z₀.₉₇₅ = 1.959963985 (Abramowitz & Stegun, Table 26.5, from memory).
const Z975 = 1.959963985;

describe('renderReport with a Monte Carlo run', () => {
  it('states N, the seed and each input σ, and prints the run\'s k percentiles (log-normal k: k₀·exp(∓1.959964 σ/RT), Eyring–Polanyi with normal quantiles)', { timeout: 30_000 }, async () => {
    const doc = oneBarrier();
    const run = analyseUncertainty(doc, { samples: 40_000, seed: 3 });
    const all = (await pagesOf(await renderReport(doc, { fontBytes, uncertainty: run }))).map((p) => p.text).join(' ');
    expect(all).toContain('Uncertainty');
    expect(all).toContain('N = 40000 samples, seed 3');
    expect(all).toMatch(/TS \(A\): barrier 1 kcal mol⁻¹ typed with the input/);
    const k = run.quantities.find((x) => x.key === 'a/step 0/kForward')!;
    const [low, high] = [Math.exp(k.interval!.low), Math.exp(k.interval!.high)].map((x) => Number(x.toPrecision(4)));
    expect(all).toContain(`k forward ${reportCell(Number(Math.exp(k.point!).toPrecision(4)))} ${reportCell(Number(Math.exp(k.interval!.median).toPrecision(4)))} ${reportCell(low!)} ${reportCell(high!)} s⁻¹`);
    // The exact reference, to the Monte Carlo tolerance (4 s.e. of the 2.5 % quantile at N = 40 000, in ln k).
    const spread = 4184 / rtJoules(298.15);
    const tol = (4 * Math.sqrt(0.025 * 0.975 / 40_000) / 0.05844) * spread;
    expect(Math.abs(Math.log(high! / Math.exp(k.point!)) - Z975 * spread)).toBeLessThan(tol);
    expect(Math.abs(Math.log(low! / Math.exp(k.point!)) + Z975 * spread)).toBeLessThan(tol);
    // Numbers keep the report's one notation.
    expect(all).not.toMatch(/\d[eE][+\-−]?\d/);
  });

  it('gives P(TDTS), P(TDI), the comparison\'s P(faster) and the variance shares of the TOF', { timeout: 30_000 }, async () => {
    const { doc } = analysedDocument({ settings: { uncertainty: { defaultSigma: 1, defaultSigmaUnit: 'kcal/mol', samples: 2000, seed: 4 } } } as never);
    const run = analyseUncertainty(doc);
    const all = (await pagesOf(await renderReport(doc, { fontBytes, uncertainty: run }))).map((p) => p.text).join(' ');
    const tdts = Object.entries(run.choices.find((c) => c.key === 'A/span/tdts')!.probabilities).sort((a, b) => b[1] - a[1]);
    expect(all).toContain(`cycle A TDTS ${tdts.map(([s, p]) => `${s} ${(100 * p).toFixed(1)} %`).join(', ')}`);
    const tdi = Object.entries(run.choices.find((c) => c.key === 'A/span/tdi')!.probabilities).sort((a, b) => b[1] - a[1]);
    expect(all).toContain(`cycle A TDI ${tdi.map(([s, p]) => `${s} ${(100 * p).toFixed(1)} %`).join(', ')}`);
    expect(all).toContain('faster pathway catalysed');
    const top = run.sensitivity.find((s) => s.pathway === 'cycle A')!.shares[0]!;
    expect(all).toContain(`cycle A ln TOF ${top.label} ${(100 * top.share).toFixed(1)} %`);
    expect(all).toContain('N = 2000 samples, seed 4');
    expect(all).toContain('document default');
    const dE = run.quantities.find((x) => x.key === 'A/span/deltaE')!.interval!;
    expect(all).toContain(`cycle A δE 22.5 ${reportCell(Number((dE.median / 4184).toFixed(1)))} ${reportCell(Number((dE.low / 4184).toFixed(1)))} ${reportCell(Number((dE.high / 4184).toFixed(1)))} kcal mol⁻¹`);
  });

  it('draws the error bars the document asks for, and says what they are', { timeout: 30_000 }, async () => {
    const run = analyseUncertainty(oneBarrier(), { samples: 2000, seed: 1 });
    const [withBars] = await pagesOf(await renderReport(oneBarrier({ errorBars: 'interval' }), { fontBytes, uncertainty: run }));
    const [noBars] = await pagesOf(await renderReport(oneBarrier(), { fontBytes, uncertainty: run }));
    // Two levels vary (TS and P): one whisker path each.
    expect(withBars!.paths).toBeGreaterThan(noBars!.paths);
    expect(withBars!.text).toContain('Error bars: the 95 % interval (2.5th–97.5th percentiles) of each level over N = 2000');
    expect(noBars!.text).not.toContain('Error bars');
  });

  it('is unchanged without a run, even where the document asks for error bars', { timeout: 30_000 }, async () => {
    const plain = await pagesOf(await renderReport(oneBarrier(), { fontBytes }));
    const asked = await pagesOf(await renderReport(oneBarrier({ errorBars: 'sigma' }), { fontBytes }));
    expect(asked).toEqual(plain);
    const all = plain.map((p) => p.text).join(' ');
    expect(all).not.toMatch(/Uncertainty|median|Monte Carlo|Error bars/);
  });
});
