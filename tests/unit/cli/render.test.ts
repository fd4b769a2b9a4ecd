import { describe, expect, it, vi } from 'vitest';
import { readFileSync } from 'node:fs';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { makeDocument, serializeDocument } from '../../../core/model/load.ts';


// Commands load their modules on first use, so the first test of each pays for loading them.
vi.setConfig({ testTimeout: 30_000 });
const root = new URL('../../../', import.meta.url).pathname;

/** Invented: 10 pathways × 50 points on the one-column preset, far more labels than the page holds. */
const crowded = serializeDocument(makeDocument({
  figure: { preset: 'single' },
  pathways: Array.from({ length: 10 }, (_, p) => ({
    id: `p${p}`, name: `pathway ${p + 1}`,
    points: Array.from({ length: 50 }, (_, i) => ({
      id: `p${p}-${i}`, label: i % 2 ? `TS${i}` : `I${i}`, kind: (i % 2 ? 'ts' : 'min') as 'ts' | 'min',
      energy: { mode: 'value' as const, value: (i % 2 ? 15 : -2) + 6 * Math.sin(i * 0.7 + p) + p * 0.3, unit: 'kcal/mol' as const },
    })),
  })),
}));

/** Invented: one barrier with σ 2 kcal/mol, 95 % error bars asked for in the figure settings. */
const withBars = (errorBars?: 'interval') => serializeDocument(makeDocument({
  figure: { preset: 'single', ...(errorBars ? { errorBars } : {}) },
  settings: { uncertainty: { samples: 500, seed: 3 } },
  pathways: [{ id: 'a', name: 'A', points: [
    { id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
    { id: 'ts', label: 'TS', kind: 'ts', energy: { mode: 'value', value: 18, unit: 'kcal/mol', sigma: 2 } },
    { id: 'p', label: 'P', kind: 'min', energy: { mode: 'value', value: -6, unit: 'kcal/mol', sigma: 2 } },
  ] }],
}));

async function render(argv: string[]) {
  let err = '';
  const outputs = new Map<string, string | Uint8Array>();
  const io: CliIo = {
    out: () => {}, err: (t) => { err += t; },
    readFile: (path) => (path === 'crowded.passline' ? crowded : path === 'bars.passline' ? withBars('interval') : path === 'nobars.passline' ? withBars() : readFileSync(new URL(path, `file://${root}`), 'utf8')),
    readBytes: () => new Uint8Array(),
    writeFile: (path, data) => { outputs.set(path, data); },
  };
  return { code: await main(argv, io), err, outputs };
}

describe('passline render: labels left out for want of room', () => {
  it('still writes the figure and exits 0, warning once with the labels named and what to do', async () => {
    const { code, err, outputs } = await render(['render', 'crowded.passline', '-o', 'fig.svg']);
    expect(code).toBe(0);
    expect(String(outputs.get('fig.svg'))).toContain('<svg');
    expect(err.split('\n').filter(Boolean)).toHaveLength(1);
    expect(err).toMatch(/^passline render: warning: \d+ labels found no clear spot inside the figure and are left out: "(I|TS)\d+" \(pathway \d+\), /);
    expect(err).toMatch(/ and \d+ more; to show them, use a larger figure size or preset, show fewer pathways, place those labels by hand, or shorten the labels\.\n$/);
  });

  it('warns about fewer labels on the wider two-column preset', async () => {
    const count = (err: string) => Number(/warning: (\d+) labels/.exec(err)?.[1]);
    const single = await render(['render', 'crowded.passline', '-o', 'a.svg']);
    const double = await render(['render', 'crowded.passline', '-o', 'b.svg', '--preset', 'double']);
    expect(count(double.err)).toBeLessThan(count(single.err));
  });

  it('says nothing when every label fits (the demo)', async () => {
    for (const preset of ['single', 'double', 'slide']) {
      const { code, err } = await render(['render', 'assets/demo/demo.passline', '-o', 'demo.pdf', '--preset', preset]);
      expect({ code, err }).toEqual({ code: 0, err: '' });
    }
  });
});

describe('passline render: error bars', () => {
  it('draws the bars the figure settings ask for (one per level with a σ) in the error-bars layer, and none otherwise', async () => {
    const bars = await render(['render', 'bars.passline', '-o', 'fig.svg']);
    expect(bars.code).toBe(0);
    const svg = String(bars.outputs.get('fig.svg'));
    expect(svg).toContain('<g id="error-bars">');
    const layer = svg.slice(svg.indexOf('<g id="error-bars">'), svg.indexOf('<g id="labels">'));
    expect(layer.match(/<path /g)).toHaveLength(2);
    const plain = await render(['render', 'nobars.passline', '-o', 'fig.svg']);
    expect(String(plain.outputs.get('fig.svg'))).not.toContain('error-bars');
  });
});
