import { describe, expect, it, vi } from 'vitest';
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { passline } from './cliBin.ts';


// Commands load their modules on first use, so the first test of each pays for loading them.
vi.setConfig({ testTimeout: 30_000 });
const root = new URL('../../../', import.meta.url).pathname;

/** Runs the CLI in-process against an in-memory file system. */
async function run(argv: string[], files: Record<string, string> = {}) {
  let out = '', err = '';
  const io: CliIo = {
    out: (t) => { out += t; }, err: (t) => { err += t; },
    readFile: (path) => {
      if (path in files) return files[path]!;
      try { return readFileSync(new URL(path, `file://${root}`), 'utf8'); } catch { throw Object.assign(new Error('missing'), { code: 'ENOENT' }); }
    },
    readBytes: () => new Uint8Array(), writeFile: () => {},
  };
  const code = await main(argv, io);
  return { code, out, err };
}

describe('passline analyze', () => {
  it('prints every pathway\'s resolved points of the demo with energies and unit', async () => {
    const { code, out } = await run(['analyze', 'assets/demo/demo.passline']);
    expect(code).toBe(0);
    expect(out).toContain('ΔG / kcal mol⁻¹ at 298.15 K');
    expect(out).toMatch(/TS1\s+TS\s+\+16\.9\s+kcal mol⁻¹\s+barrier 21\.1 kcal mol⁻¹ from LA·AE/);
  });

  it('--json gives points with provenance and a checks array; --unit and --temperature apply', async () => {
    const { code, out } = await run(['analyze', 'assets/demo/demo.passline', '--json', '--unit', 'kJ/mol', '--temperature', '310']);
    expect(code).toBe(0);
    const report = JSON.parse(out);
    expect(report).toMatchObject({ quantity: 'G', unit: 'kJ/mol', temperatureK: 310 });
    const ts = report.pathways[0].points[1];
    expect(ts).toMatchObject({ label: 'TS-th', kind: 'ts', provenance: { route: 'typed' } });
    expect(ts.energy).toBeCloseTo(31.8 * 4.184, 9); // thermochemical calorie (NIST SP 811)
    expect(report.checks).toEqual([]);
  });

  it('reads a CSV table and reports its findings in checks', async () => {
    const csv = 'pathway,label,kind,G [kcal/mol]\nA,R,min,0\nA,T,ts,-2\nA,P,min,-5\n';
    const { code, out } = await run(['analyze', 'points.csv', '--json'], { 'points.csv': csv });
    expect(code).toBe(0);
    const report = JSON.parse(out);
    expect(report.checks[0]).toMatchObject({ severity: 'error', code: 'ts-below-neighbour', pathway: 'pathway-1', point: 'p2' });
  });

  it('bad input: exit 1 with one line naming the file and the problem', async () => {
    const bad = await run(['analyze', 'bad.csv'], { 'bad.csv': 'pathway,label,kind,G [kcal/mol]\nA,R,min,zero\n' });
    expect(bad).toMatchObject({ code: 1, out: '' });
    expect(bad.err).toBe('passline analyze: bad.csv: line 2, column "G [kcal/mol]" ("zero"): expected a number\n');
    const missing = await run(['analyze', 'nowhere.passline']);
    expect(missing).toMatchObject({ code: 1, err: 'passline analyze: cannot read nowhere.passline: ENOENT\n' });
    const newer = await run(['analyze', 'new.passline'], { 'new.passline': '{"format":"passline","version":99}' });
    expect(newer.err).toContain('format version 99, written by a newer Passline');
  });

  it('bad usage: exit 2', async () => {
    expect((await run(['analyze'])).code).toBe(2);
    expect((await run(['analyze', 'a', '--bogus'])).code).toBe(2);
    expect((await run(['analyze', 'assets/demo/demo.passline', '--unit', 'furlong'])).err).toContain('--unit: unknown unit "furlong"');
    expect((await run(['frobnicate'])).code).toBe(2);
    expect((await run([])).code).toBe(2);
  });

  it('--help and --version', async () => {
    expect((await run(['--help'])).out).toContain('passline analyze FILE');
    expect((await run(['--version'])).out).toMatch(/^passline \d+\.\d+\.\d+\n$/);
  });
});

describe('passline thermo', () => {
  const reaction = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)';
  it('computes methane combustion from NIST-JANAF data (REFERENCE.md §4, R1)', async () => {
    const { code, out } = await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', reaction, '--json']);
    expect(code).toBe(0);
    const r = JSON.parse(out);
    expect(r.dH).toBeCloseTo(-890.309, 3);
    expect(r.dS).toBeCloseTo(-242.85, 3);
    expect(r.dG).toBeCloseTo(-817.9032725, 6);
    expect(r.dGfromFormation).toBeCloseTo(-817.903, 3);
    // K = exp(−dG/RT) with the reported dG (KBasis dH-TdS); ΣνΔfG° gives 1.95166899547e+143 beside it.
    expect(r.KBasis).toBe('dH-TdS');
    expect(r.K / Math.exp(817903.2725 / (8.31446261815324 * 298.15))).toBeCloseTo(1, 9);
    expect(r.KfromFormation / 1.95166899547e143).toBeCloseTo(1, 9);
    expect(r.crossoverK).toBeCloseTo(3666.086061, 5);
    expect(r.warnings.join(' ')).toContain('not a process-safety assessment');
  });

  it('back-solves a formation value: ΔfH°(CH4, g) = −74.873 kJ/mol from ΔrH° = −890.309 (NIST-JANAF, REFERENCE.md §4)', async () => {
    const { code, out } = await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', reaction, '--solve', 'CH4(g)', '--given', 'dH=-890.309']);
    expect(code).toBe(0);
    expect(out).toMatch(/^ΔfH°\(CH4\(g\)\) = -74\.873 kJ mol⁻¹/);
    expect((await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', reaction, '--solve', 'CH4(g)', '--given', 'dX=1'])).code).toBe(2);
    const json = await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', reaction, '--solve', 'CH4(g)', '--given', 'dH=-890.309', '--json']);
    expect(JSON.parse(json.out)).toMatchObject({ species: 'CH4(g)', key: 'dfH', unit: 'kJ mol⁻¹', given: { value: -890.309 } });
    expect(JSON.parse(json.out).value).toBeCloseTo(-74.873, 9);
  });

  it('names an unknown species, an unbalanced reaction and a missing option', async () => {
    expect((await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g)'])).err).toContain("unknown species 'H2O(g)'");
    expect((await run(['thermo', 'tests/fixtures/janafCombustion.csv', '--reaction', 'CH4(g) + O2(g) -> CO2(g) + 2 H2O(l)'])).err).toContain('unbalanced: 2 more O on the right');
    expect((await run(['thermo', 'tests/fixtures/janafCombustion.csv'])).code).toBe(2);
  });
});

describe('the installed command', () => {
  it('runs as a real process through its bin entry (the bundle), with exit codes', () => {
    expect(passline(['--version']).stdout).toMatch(/^passline \d+\.\d+\.\d+\n$/);
    const failed = passline(['analyze', `${root}no-such-file.csv`]);
    expect(failed.status).toBe(1);
    expect(failed.stderr).toBe(`passline analyze: cannot read ${root}no-such-file.csv: ENOENT\n`); // one line, no stack trace
  });

  it('gives the same answers from the TypeScript sources through tsx (the developers\' route)', () => {
    const fromSources = spawnSync('node', [`${root}core/cli/passline.mjs`, 'analyze', 'assets/demo/demo.passline', '--json'], { cwd: root, encoding: 'utf8' });
    expect(fromSources.status).toBe(0);
    expect(fromSources.stdout).toBe(passline(['analyze', 'assets/demo/demo.passline', '--json']).stdout);
  }, 60_000); // a cold Node start with tsx; generous for a loaded 2-core machine
});

describe('help', () => {
  it('COMMAND --help (and help COMMAND) prints that command\'s usage and options only', async () => {
    for (const argv of [['render', '--help'], ['render', '-h'], ['help', 'render']]) {
      const { code, out } = await run(argv);
      expect(code).toBe(0);
      expect(out).toContain('passline render FILE -o OUT.svg|OUT.pdf|OUT.png');
      expect(out).toContain('--out-dir DIR');
      expect(out).not.toMatch(/passline (analyze|thermo|simulate|report|tables|scan) /);
    }
    expect((await run(['analyze', '--help'])).out).not.toContain('passline render');
  });

  it('a usage error points at the command\'s own help', async () => {
    expect((await run(['render', 'a.passline', '--bogus'])).err).toMatch(/\(try passline render --help\)\n$/);
  });

  it('a command name that is only a property of every object is unknown, not a crash', async () => {
    expect(await run(['constructor'])).toMatchObject({ code: 2, err: 'passline: unknown command "constructor" (try passline --help)\n' });
    expect((await run(['help', 'toString'])).out).toContain('passline analyze FILE');
  });
});

describe('passline simulate', () => {
  // REFERENCE.md §6, cycle A (Kozuch & Shaik energetic span; steady state by SciPy/mpmath): TOF = 1.66434592407551e-4 s⁻¹.
  const cycleA = JSON.stringify({
    format: 'passline', version: 2,
    pathways: [{ id: 'A', name: 'Cycle A', cycle: true, points: [
      ['I1', 'min', 0], ['T1', 'ts', 12], ['I2', 'min', -6], ['T2', 'ts', 15], ['I3', 'min', -4.5], ['T3', 'ts', 16.5], ['I4', 'min', -3], ['T4', 'ts', 8], ['I1′', 'min', -2],
    ].map(([label, kind, value]) => ({ id: `${label}`, label, kind, energy: { mode: 'value', value, unit: 'kcal/mol' } })) }],
  });

  it('prints concentrations as CSV and the simulated steady-state TOF of a cycle', async () => {
    const { code, out, err } = await run(['simulate', 'a.passline', '--until', '2000', '--points', '20'], { 'a.passline': cycleA });
    expect(code).toBe(0);
    const rows = out.trim().split(/\r?\n/);
    expect(rows[0]).toBe('time [s],I1 [mol/L],I2 [mol/L],I3 [mol/L],I4 [mol/L],conversion');
    expect(rows).toHaveLength(22);
    const last = rows.at(-1)!.split(',').map(Number);
    expect(last[1]! + last[2]! + last[3]! + last[4]!).toBeCloseTo(1, 6); // catalyst is conserved (CSV has 8 digits)
    const tof = Number(/steady-state TOF \(simulated\): (\S+) s⁻¹/.exec(err)?.[1]);
    expect(Math.abs(tof / 1.66434592407551e-4 - 1)).toBeLessThan(1e-4);
  });

  it('--species reports substrate conversion, product yield and TON instead of the catalyst\'s conversion', async () => {
    const pt = (id: string, kind: string, value: number, comp: string[]) => ({ id, label: id, kind, energy: { mode: 'value', value, unit: 'kcal/mol' }, composition: comp.map((species) => ({ species, count: 1 })) });
    const doc = JSON.stringify({
      format: 'passline', version: 2,
      species: ['cat', 'S', 'catS', 'TS1', 'TS2', 'P'].map((id) => ({ id, label: id })),
      pathways: [{ id: 'c', name: 'Cycle', cycle: true, points: [pt('cat + S', 'min', 0, ['cat', 'S']), pt('TS1', 'ts', 10, ['TS1']), pt('cat·S', 'min', -2, ['catS']), pt('TS2', 'ts', 15, ['TS2']), pt('cat + P', 'min', -20, ['cat', 'P'])] }],
    });
    const { code, out } = await run(['simulate', 'c.passline', '--species', '--init', 'cat=0.01', '--init', 'S=1', '--until', '1e4', '--points', '10'], { 'c.passline': doc });
    expect(code).toBe(0);
    const rows = out.trim().split(/\r?\n/);
    expect(rows[0]).toMatch(/,conversion of S,yield of P,TON of P$/);
    // By hand: all of 1 mol/L S over 0.01 mol/L catalyst is 100 turnovers.
    expect(Number(rows.at(-1)!.split(',').at(-1))).toBeCloseTo(100, 3);
  });

  it('names a bad --init and an unknown pathway', async () => {
    expect((await run(['simulate', 'a.passline', '--init', 'I9=1'], { 'a.passline': cycleA })).err).toContain('"I9" is not a minimum of "Cycle A"');
    expect((await run(['simulate', 'a.passline', '--init', 'I1=-1'], { 'a.passline': cycleA })).code).toBe(2);
    expect((await run(['simulate', 'a.passline', '--pathway', 'nope'], { 'a.passline': cycleA })).err).toContain('no pathway "nope"');
  });
});

describe('passline render', () => {
  const outputs = new Map<string, string | Uint8Array>();
  const renderRun = async (argv: string[]) => {
    let err = '';
    const io: CliIo = {
      out: () => {}, err: (t) => { err += t; },
      readFile: (path) => readFileSync(new URL(path, `file://${root}`), 'utf8'),
      readBytes: () => new Uint8Array(),
      writeFile: (path, data) => { if (path.startsWith('/nope/')) throw Object.assign(new Error('no dir'), { code: 'ENOENT' }); outputs.set(path, data); },
    };
    return { code: await main(argv, io), err };
  };

  it('writes SVG text, PDF bytes and PNG bytes of the demo', async () => {
    for (const out of ['fig.svg', 'fig.pdf', 'fig.png']) expect((await renderRun(['render', 'assets/demo/demo.passline', '-o', out, '--preset', 'single'])).code).toBe(0);
    expect(String(outputs.get('fig.svg'))).toContain('<svg');
    expect(String(outputs.get('fig.svg'))).toContain('TS-th');
    expect(new TextDecoder('latin1').decode((outputs.get('fig.pdf') as Uint8Array).slice(0, 5))).toBe('%PDF-');
    // PNG signature (ISO/IEC 15948 / W3C PNG spec): 89 50 4E 47 0D 0A 1A 0A.
    expect([...(outputs.get('fig.png') as Uint8Array).slice(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  }, 30_000); // three renders on a loaded 2-core machine

  it('report writes a PDF; tables writes Markdown and CSV with units in the headers', async () => {
    expect((await renderRun(['report', 'assets/demo/demo.passline', '-o', 'r.pdf'])).code).toBe(0);
    expect(new TextDecoder('latin1').decode((outputs.get('r.pdf') as Uint8Array).slice(0, 5))).toBe('%PDF-');
    expect((await renderRun(['tables', 'assets/demo/demo.passline', '-o', 't.md'])).code).toBe(0);
    const md = String(outputs.get('t.md'));
    expect(md).toContain('## Steps');
    expect(md).toContain('ΔG / kcal mol⁻¹');
    expect((await renderRun(['tables', 'assets/demo/demo.passline', '-o', 't.csv'])).code).toBe(0);
    expect(String(outputs.get('t.csv'))).toMatch(/^Energies\r\npathway,point,kind,ΔG \/ kcal mol⁻¹,source\r\n/);
    expect((await renderRun(['report', 'assets/demo/demo.passline', '-o', 'r.docx'])).code).toBe(2);
  }, 30_000);

  it('bad options are usage errors; an unwritable output is one line with exit 1', async () => {
    expect(await renderRun(['render', 'assets/demo/demo.passline', '-o', 'fig.gif'])).toMatchObject({ code: 2 });
    expect((await renderRun(['render', 'assets/demo/demo.passline', '-o', 'f.png', '--dpi', '5'])).err).toContain('--dpi: resolution 5 dpi is outside 36 to 2400 dpi');
    expect((await renderRun(['render', 'assets/demo/demo.passline', '-o', 'f.svg', '--theme', 'neon'])).err).toContain('--theme: expected one of colour, greyscale, dark');
    expect((await renderRun(['render', 'assets/demo/demo.passline'])).code).toBe(2);
    expect(await renderRun(['render', 'assets/demo/demo.passline', '-o', '/nope/f.svg'])).toEqual({ code: 1, err: 'passline render: cannot write /nope/f.svg: ENOENT\n' });
  });
});
