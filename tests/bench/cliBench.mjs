/**
 * Command-line start-up (node tests/bench/cliBench.mjs, after `npm run build:cli`; part of
 * `npm run bench`). Runs the installed `passline` (package.json's bin, the bundle) as real
 * processes, side by side and alternating with the things it is compared with, so load on
 * the machine falls on both sides alike. Prints, per process: CPU (user + system of the
 * process and its threads, from /proc/self/stat's cutime/cstime of waited-for children,
 * mean of the rounds) and wall time (median), then the issue 15 goals as ratios of CPU:
 *   passline --version            ≤ 2.5 × node -e 0
 *   render -o x.pdf, analyze --json of a small document ≤ 0.5 × the matplotlib script
 *     (figureMatplotlib.py drawing the same table of points to PDF)
 *   render of 20 documents in one run (--out-dir) ≤ 6 × render of one
 * and the start-up of every command on the same small document. Not a test: nothing fails.
 * Usage: node tests/bench/cliBench.mjs [ROUNDS]   (default 10)
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
const bin = join(root, JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).bin.passline);
const rounds = Number(process.argv[2] ?? 10);
const work = mkdtempSync(join(tmpdir(), 'passline-cli-bench-'));
const small = join(root, 'tests/bench/smallProfile.csv');
const script = join(root, 'tests/bench/figureMatplotlib.py');

if (!existsSync(bin)) {
  console.log(`cli bench: skipped (no bundle at ${bin}; run npm run build:cli)`);
  process.exit(0);
}

// Child CPU on Linux: clock ticks of waited-for children (fields 16 and 17 of /proc/self/stat).
const ticksPerSecond = Number(spawnSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).stdout.trim()) || 100;
const haveProc = existsSync('/proc/self/stat');
function childCpuMs() {
  const fields = readFileSync('/proc/self/stat', 'utf8').split(') ')[1].split(' ');
  return ((Number(fields[13]) + Number(fields[14])) / ticksPerSecond) * 1000;
}

/** Runs one process; returns its CPU (ms, NaN without /proc) and wall time (ms). */
function measure([cmd, ...args]) {
  const cpu0 = haveProc ? childCpuMs() : NaN;
  const t0 = performance.now();
  const run = spawnSync(cmd, args, { cwd: work, encoding: 'utf8' });
  const wall = performance.now() - t0;
  if (run.status !== 0) throw new Error(`${[cmd, ...args].join(' ')} exited ${run.status}: ${run.stderr.trim()}`);
  return { cpu: haveProc ? childCpuMs() - cpu0 : NaN, wall };
}

/** Every task run once per round, in turn, after one warm-up round (file cache). */
function alternate(tasks, n) {
  const seen = Object.fromEntries(Object.keys(tasks).map((k) => [k, { cpu: [], wall: [] }]));
  for (let r = -1; r < n; r++) {
    for (const [name, argv] of Object.entries(tasks)) {
      const m = measure(argv);
      if (r >= 0) { seen[name].cpu.push(m.cpu); seen[name].wall.push(m.wall); }
    }
  }
  const mean = (v) => v.reduce((a, b) => a + b, 0) / v.length;
  const median = (v) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
  return Object.fromEntries(Object.entries(seen).map(([k, v]) => [k, { cpu: mean(v.cpu), wall: median(v.wall) }]));
}

const passline = (...args) => [process.execPath, bin, ...args];
const python = ['python3', '/usr/bin/python3'].find((p) => spawnSync(p, ['-c', 'import matplotlib'], { encoding: 'utf8' }).status === 0);

const row = (name, t) => `  ${name.padEnd(46)} ${t.cpu.toFixed(0).padStart(6)} ms CPU ${t.wall.toFixed(0).padStart(7)} ms wall`;
const ratio = (label, a, b, goal) => {
  const cpu = a.cpu / b.cpu;
  return `  ${label.padEnd(46)} ${cpu.toFixed(2).padStart(6)} × CPU (wall ${(a.wall / b.wall).toFixed(2)} ×)  goal ≤ ${goal}: ${cpu <= goal ? 'met' : 'NOT met'}`;
};

console.log(`passline CLI, ${rounds} alternating rounds; CPU ${haveProc ? 'mean' : 'not measured (no /proc)'}, wall median`);
if (!python) console.log('  matplotlib: NOT MEASURED — neither python3 nor /usr/bin/python3 can import matplotlib (Debian: apt-get install python3-matplotlib); its two ratios are skipped');

// 1. The goals, side by side.
const goals = alternate({
  'node -e 0': [process.execPath, '-e', '0'],
  'passline --version': passline('--version'),
  'passline render small.csv -o x.pdf': passline('render', small, '-o', 'x.pdf'),
  'passline analyze small.csv --json': passline('analyze', small, '--json'),
  ...(python ? { 'matplotlib script, same points to PDF': [python, script, 'mpl.pdf', small] } : {}),
}, rounds);
for (const [name, t] of Object.entries(goals)) console.log(row(name, t));
console.log('Goals (issue 15):');
console.log(ratio('passline --version / node -e 0', goals['passline --version'], goals['node -e 0'], 2.5));
if (python) {
  const mpl = goals['matplotlib script, same points to PDF'];
  console.log(ratio('render -o x.pdf / matplotlib script', goals['passline render small.csv -o x.pdf'], mpl, 0.5));
  console.log(ratio('analyze --json / matplotlib script', goals['passline analyze small.csv --json'], mpl, 0.5));
} else {
  console.log('  render -o x.pdf / matplotlib script             skipped (no matplotlib)');
  console.log('  analyze --json / matplotlib script              skipped (no matplotlib)');
}

// 2. Batch: 20 invented variants of the small table in one process, against one.
const header = readFileSync(small, 'utf8').split('\n')[0];
const body = readFileSync(small, 'utf8').trim().split('\n').slice(1);
const inputs = Array.from({ length: 20 }, (_, i) => {
  const path = join(work, `variant-${String(i + 1).padStart(2, '0')}.csv`);
  // Shift every energy a little per variant so no two figures are alike.
  writeFileSync(path, [header, ...body.map((line) => line.replace(/,(-?[\d.]+),/, (_, g) => `,${(Number(g) * (1 + i / 40)).toFixed(1)},`))].join('\n') + '\n');
  return path;
});
for (const format of ['svg', 'pdf']) {
  const batch = alternate({
    one: passline('render', inputs[0], '--out-dir', `one-${format}`, '--format', format),
    twenty: passline('render', ...inputs, '--out-dir', `twenty-${format}`, '--format', format),
  }, Math.max(3, Math.round(rounds / 2)));
  console.log(row(`render --out-dir --format ${format}: 1 document`, batch.one));
  console.log(row(`render --out-dir --format ${format}: 20 documents`, batch.twenty));
  console.log(ratio(`batch ${format}: 20 documents / 1 document`, batch.twenty, batch.one, 6));
}

// 3. Start-up of every command on the small document.
const reaction = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)';
const each = alternate({
  'node -e 0': [process.execPath, '-e', '0'],
  '--version': passline('--version'),
  '--help': passline('--help'),
  'analyze': passline('analyze', small),
  'analyze --json': passline('analyze', small, '--json'),
  'thermo (JANAF fixture)': passline('thermo', join(root, 'tests/fixtures/janafCombustion.csv'), '--reaction', reaction),
  'simulate': passline('simulate', small),
  'scan': passline('scan', small),
  'render -o x.svg': passline('render', small, '-o', 'x.svg'),
  'render -o x.pdf': passline('render', small, '-o', 'x.pdf'),
  'render -o x.png': passline('render', small, '-o', 'x.png'),
  'report -o r.pdf': passline('report', small, '-o', 'r.pdf'),
  'tables -o t.md': passline('tables', small, '-o', 't.md'),
}, Math.max(3, Math.round(rounds / 2)));
console.log('Start-up of every command (whole process, small document):');
for (const [name, t] of Object.entries(each)) console.log(`${row(name, t)}  ${(t.cpu / each['node -e 0'].cpu).toFixed(1).padStart(5)} × node -e 0`);
