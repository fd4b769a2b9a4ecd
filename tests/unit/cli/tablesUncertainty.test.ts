import { describe, expect, it } from 'vitest';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { ONE_BARRIER_DOC } from './oneBarrierDoc.ts';

const DOC = ONE_BARRIER_DOC;

async function run(argv: string[], doc = DOC) {
  let err = '';
  const files = new Map<string, string | Uint8Array>();
  const io: CliIo = { out: () => {}, err: (t) => { err += t; }, readFile: () => doc, readBytes: () => new Uint8Array(), writeFile: (path, data) => { files.set(path, data); } };
  return { code: await main(argv, io), err, files };
}

describe('passline tables / report --uncertainty', { timeout: 30_000 }, () => { // Monte Carlo runs on a shared 2-core machine
  it('tables adds median and 95 % columns and states N, seed and σ; the same seed gives the same file', async () => {
    const a = await run(['tables', 'x.passline', '-o', 't.md', '--uncertainty', '500', '--seed', '9']);
    expect(a.code).toBe(0);
    const md = a.files.get('t.md') as string;
    expect(md).toContain('N = 500 samples, seed 9');
    expect(md).toContain('TS (A): barrier 1 kcal mol⁻¹');
    expect(md).toContain('ΔG‡ forward, 97.5 % / kcal mol⁻¹');
    const b = await run(['tables', 'x.passline', '-o', 't.md', '--uncertainty', '500', '--seed', '9']);
    expect(b.files.get('t.md')).toBe(md);
    const csv = (await run(['tables', 'x.passline', '-o', 't.csv', '--uncertainty', '500'])).files.get('t.csv') as string;
    expect(csv).toMatch(/^Uncertainty run\r\nsamples N,seed,method,interval\r\n500,1,/);
  });

  it('tables without --uncertainty has no intervals', async () => {
    const md = (await run(['tables', 'x.passline', '-o', 't.md'])).files.get('t.md') as string;
    expect(md).not.toMatch(/median|Uncertainty|σ/);
  });

  it('report takes the same options and the same usage errors as analyze', async () => {
    const r = await run(['report', 'x.passline', '-o', 'r.pdf', '--uncertainty', '200', '--seed', '2']);
    expect(r.code).toBe(0);
    expect(new TextDecoder('latin1').decode((r.files.get('r.pdf') as Uint8Array).slice(0, 5))).toBe('%PDF-');
    expect(await run(['report', 'x.passline', '-o', 'r.pdf', '--seed', '4'])).toMatchObject({ code: 2, err: expect.stringContaining('--seed needs --uncertainty') });
    expect(await run(['tables', 'x.passline', '-o', 't.md', '--uncertainty', 'lots'])).toMatchObject({ code: 2, err: expect.stringContaining('--uncertainty: expected a whole number') });
  });

  it('report draws the error bars figure.errorBars asks for, from the document\'s own samples and seed, and states them', { timeout: 30_000 }, async () => {
    const doc = JSON.parse(DOC);
    doc.figure = { errorBars: 'interval' };
    doc.settings = { uncertainty: { samples: 300, seed: 12 } };
    const pdf = (await run(['report', 'x.passline', '-o', 'r.pdf'], JSON.stringify(doc))).files.get('r.pdf') as Uint8Array;
    const reader = await getDocument({ data: pdf.slice(), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
    const first = (await (await reader.getPage(1)).getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join(' ').replace(/\s+/g, ' ');
    expect(first).toContain('Error bars: the 95 % interval (2.5th–97.5th percentiles) of each level over N = 300 Monte Carlo samples, seed 12');
  });
});
