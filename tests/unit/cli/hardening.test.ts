import { describe, expect, it } from 'vitest';
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { readUtf8 } from '../../../core/cli/terminal.ts';

// Hostile inputs from the audit in issue 14; limits are BOUNDS (core/model/bounds.ts, common practice).
const root = new URL('../../../', import.meta.url).pathname;
const demo = readFileSync(`${root}assets/demo/demo.passline`, 'utf8');
const bin = `${root}core/cli/passline.mjs`;

async function run(argv: string[], files: Record<string, string> = {}) {
  let out = '', err = '';
  const written: string[] = [];
  const io: CliIo = {
    out: (t) => { out += t; }, err: (t) => { err += t; },
    readFile: (path) => {
      if (path in files) return files[path]!;
      return readFileSync(new URL(path, `file://${root}`), 'utf8');
    },
    readBytes: () => new Uint8Array(), writeFile: (path) => { written.push(path); },
  };
  const code = await main(argv, io);
  return { code, out, err, written };
}

const withDemo = (change: (d: Record<string, any>) => void) => {
  const d = JSON.parse(demo);
  change(d);
  return { 'd.passline': JSON.stringify(d) };
};

describe('CLI options read the same bounds as the schema', () => {
  it('refuses absurd numbers at once, naming the option and the bound; nothing is written', async () => {
    expect((await run(['analyze', 'assets/demo/demo.passline', '--temperature', '1e12'])).err).toBe('passline analyze: --temperature: temperature 1000000000000 K is outside 1 to 10000 K\n');
    expect((await run(['scan', 'assets/demo/demo.passline', '--to', '1e308'])).err).toBe('passline scan: --to: temperature 1e+308 K is outside 1 to 10000 K\n');
    expect((await run(['simulate', 'assets/demo/demo.passline', '--points', '1e9'])).err).toBe('passline simulate: --points: number of output times 1000000000 is outside 2 to 10000\n');
    const wide = await run(['render', 'assets/demo/demo.passline', '-o', 'f.svg', '--width-mm', '1e6']);
    expect(wide).toMatchObject({ code: 2, err: 'passline render: --width-mm: figure size 1000000 mm is outside 20 to 2000 mm\n', written: [] });
  });

  it('accepts a negative value written with a space, and then explains the bound', async () => {
    expect((await run(['simulate', 'assets/demo/demo.passline', '--until', '-1'])).err).toBe('passline simulate: --until: time -1 s is outside 1 × 10⁻¹⁵ to 1 × 10²⁰ s\n');
    expect((await run(['render', 'assets/demo/demo.passline', '-o', 'f.svg', '--width-mm', '-5'])).err).toContain('--width-mm: figure size -5 mm is outside 20 to 2000 mm');
  });

  it('names --init and the label for a bad starting concentration', async () => {
    expect((await run(['simulate', 'assets/demo/demo.passline', '--init', 'INT=1e308'])).err).toBe('passline simulate: --init INT: concentration 1e+308 mol/L is outside 0 to 10000 mol/L\n');
  });

  it('scan --count 1 with --to is explained instead of ignoring --to', async () => {
    const r = await run(['scan', 'assets/demo/demo.passline', '--count', '1', '--to', '400']);
    expect(r).toMatchObject({ code: 2, out: '' });
    expect(r.err).toContain('--count 1 scans only --from');
  });

  it('--points 10000 runs without a solver step-budget message', async () => {
    const r = await run(['simulate', 'assets/demo/demo.passline', '--points', '10000']);
    expect(r.err).not.toContain('max-steps');
    expect(r.code).toBe(0);
    expect(r.out.trim().split(/\r?\n/)).toHaveLength(10_002); // header + t = 0 + 10000 times
  }, 60_000);

  it('refuses a simulation with more states than the bound at once', async () => {
    const points = Array.from({ length: 203 }, (_, i) => ({ id: `p${i}`, label: `P${i}`, kind: i % 2 ? 'ts' : 'min', energy: { mode: 'value', value: i % 2 ? 10 : 0, unit: 'kcal/mol' } }));
    const big = JSON.stringify({ format: 'passline', version: 2, pathways: [{ id: 'a', name: 'A', points }] });
    expect((await run(['simulate', 'big.passline'], { 'big.passline': big })).err).toContain('number of states in a simulation 102 is outside 1 to 100');
  });
});

describe('CLI messages', () => {
  it('prints the message for [] or null once', async () => {
    expect((await run(['analyze', 'a.passline'], { 'a.passline': '[]' })).err).toBe('passline analyze: a.passline: (document): expected a JSON object at the top of the file\n');
    expect((await run(['analyze', 'a.json'], { 'a.json': 'null' })).err).toBe('passline analyze: a.json: (document): expected a JSON object at the top of the file\n');
  });

  it('says when input is not UTF-8 instead of reading U+FFFD', () => {
    const dir = mkdtempSync(join(tmpdir(), 'passline-utf8-'));
    const file = join(dir, 'latin1.csv');
    writeFileSync(file, Buffer.from('pathway,label,kind,G [kcal/mol]\nA,R\xe9,min,0\n', 'latin1'));
    expect(() => readUtf8(file)).toThrow('not UTF-8 text (first bad byte on line 2); save the file as UTF-8');
  });
});

describe('findings the figure depends on', () => {
  it('reports annotations naming missing points and empty pathways; --strict exits 1 on errors and the summary counts them', async () => {
    const files = withDemo((d) => {
      d.pathways.push({ id: 'empty', name: 'Empty', points: [] });
      d.figure = { annotations: [{ type: 'barrier', pathway: d.pathways[0].id, from: 'ghost', to: 'ghost2' }] };
    });
    const plain = await run(['analyze', 'd.passline'], files);
    expect(plain.code).toBe(0);
    expect(plain.out).toContain('warning: [pathway-empty] pathway "Empty" has no points');
    expect(plain.out).toContain('[annotation-point] figure annotation 1 (barrier): pathway "Thermal" has no point "ghost"');
    expect(plain.out.trimEnd().split('\n').at(-1)).toBe('findings: 0 errors, 3 warnings, 0 notes'); // + the analysis' own no-barrier warning
    const csv = 'pathway,label,kind,G [kcal/mol]\nA,R,min,0\nA,T,ts,-2\nA,P,min,-5\n';
    const strict = await run(['analyze', 'p.csv', '--strict'], { 'p.csv': csv });
    expect(strict.code).toBe(1);
    expect(strict.out).toContain('findings: 1 error, 0 warnings, 0 notes');
    expect(strict.err).toContain('--strict: 1 finding of severity error');
    expect((await run(['analyze', 'p.csv'], { 'p.csv': csv })).code).toBe(0);
    const render = await run(['render', 'p.csv', '--strict', '-o', 'f.svg'], { 'p.csv': csv });
    expect(render).toMatchObject({ code: 1, written: [] });
  });

  it('refuses to draw a blank figure', async () => {
    const empty = await run(['render', 'e.passline', '-o', 'f.svg'], { 'e.passline': JSON.stringify({ format: 'passline', version: 2, pathways: [{ id: 'a', name: 'A', points: [] }] }) });
    expect(empty).toMatchObject({ code: 1, written: [], err: 'passline render: e.passline: no pathway has any points; there is nothing to draw; nothing was written\n' });
  });
});

describe('hostile label text', () => {
  const files = withDemo((d) => { d.pathways[0].points[0].label = 'R\u001b[31m\u0000\u202Eab𝒜'; });

  it('terminal output carries no escape sequence or bidi override', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'passline-label-')), 'd.passline');
    writeFileSync(file, files['d.passline']);
    const r = spawnSync('node', [bin, 'analyze', file], { encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).not.toMatch(/[\u0000\u001b\u202E]/);
    expect(r.stdout).toContain('R\uFFFD[31m\uFFFDab𝒜');
  }, 60_000);

  it('SVG stays XML 1.0; PDF and PNG warn naming characters the font lacks', async () => {
    const outputs = new Map<string, string | Uint8Array>();
    let err = '';
    const io: CliIo = {
      out: () => {}, err: (t) => { err += t; }, readFile: () => files['d.passline'], readBytes: () => new Uint8Array(),
      writeFile: (path, data) => { outputs.set(path, data); },
    };
    expect(await main(['render', 'd.passline', '-o', 'f.svg'], io)).toBe(0);
    const svg = String(outputs.get('f.svg'));
    expect(svg).not.toMatch(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u202E]/); // W3C XML 1.0 §2.2 Char
    expect(err).not.toContain('no glyph');
    expect(await main(['render', 'd.passline', '-o', 'f.pdf'], io)).toBe(0);
    expect(err).toContain('warning: the embedded font DejaVu Sans has no glyph for "𝒜" (U+1D49C); they are missing from the PDF');
  }, 30_000);
});

describe('a reader that goes away early', () => {
  it('EPIPE on stdout ends quietly: no stack trace', async () => {
    const child = spawn('node', [bin, 'analyze', `${root}assets/demo/demo.passline`, '--json'], { stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout.destroy(); // the reader is gone before the first byte is written
    let stderr = '';
    child.stderr.on('data', (b) => { stderr += b; });
    const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
    expect(stderr).not.toContain('    at ');
    expect(stderr).not.toContain('EPIPE');
    expect(code).toBe(0);
  }, 60_000);
});

describe('large documents', () => {
  it('says before long work starts that it will take a while', async () => {
    const points = Array.from({ length: 601 }, (_, i) => ({ id: `p${i}`, label: `P${i}`, kind: i % 2 ? 'ts' : 'min', energy: { mode: 'value', value: i % 2 ? 10 : 0, unit: 'kcal/mol' } }));
    const big = JSON.stringify({ format: 'passline', version: 2, pathways: [{ id: 'a', name: 'A', points }] });
    const r = await run(['scan', 'big.passline', '--count', '2'], { 'big.passline': big });
    expect(r.code).toBe(0);
    expect(r.err).toContain('passline scan: 601 points (more than the usual 500); this may take a while…');
    // and reports its progress as it goes, one line per temperature done
    expect(r.err).toContain('passline scan: 1/2 temperatures\npassline scan: 2/2 temperatures\n');
  }, 60_000);

  it('render names each stage of a large figure as it starts, with the time so far', async () => {
    const points = Array.from({ length: 601 }, (_, i) => ({ id: `p${i}`, label: `P${i}`, kind: i % 2 ? 'ts' : 'min', energy: { mode: 'value', value: i % 2 ? 10 : 0, unit: 'kcal/mol' } }));
    const big = JSON.stringify({ format: 'passline', version: 3, pathways: [{ id: 'a', name: 'A', points }] });
    const r = await run(['render', 'big.passline', '-o', 'big.svg'], { 'big.passline': big });
    expect(r.code).toBe(0);
    const stages = [...r.err.matchAll(/passline render: (.+?)… \((\d+\.\d) s\)/g)].map((m) => m[1]);
    expect(stages).toEqual(['resolving the profile', 'laying out the figure', 'writing the SVG', 'done']);
    const small = JSON.stringify({ format: 'passline', version: 3, pathways: [{ id: 'a', name: 'A', points: points.slice(0, 3) }] });
    expect((await run(['render', 'small.passline', '-o', 'small.svg'], { 'small.passline': small })).err).not.toContain('laying out');
  }, 60_000);
});
