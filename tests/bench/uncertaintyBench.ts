/**
 * Monte Carlo timings (npx tsx tests/bench/uncertaintyBench.ts): 10 000 samples of a 50-point
 * catalytic cycle with σ on every point, through the linear-resolution fast path and through
 * the full pipeline (every sample resolved and analysed), with the ratio to one point-estimate
 * analysis. Issue 18 asks < 1 s in-process for the fast run. Prints numbers; not a test.
 */
import { analyseDocument } from '../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../core/model/load.ts';
import { analyseUncertainty, startUncertainty } from '../../core/uncertainty/uncertaintyRun.ts';

// Invented cycle: a downhill zig-zag, σ = 1 kcal/mol on every typed value but the reference.
const points = Array.from({ length: 49 }, (_, i) => ({
  id: `p${i}`, label: i % 2 ? `T${i}` : `I${i}`, kind: (i % 2 ? 'ts' : 'min') as 'ts' | 'min',
  energy: { mode: 'value' as const, value: (i % 2 ? 14 : 0) + 3 * Math.sin(i) - i * 0.05, unit: 'kcal/mol' as const, ...(i > 0 ? { sigma: 1 } : {}) },
}));
points.push({ id: 'end', label: 'I0′', kind: 'min', energy: { mode: 'value', value: -6, unit: 'kcal/mol', sigma: 1 } });
const doc = makeDocument({ pathways: [{ id: 'c', name: 'bench cycle', cycle: true, points }] });

const cpuMs = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };

/** Median wall and CPU time of `runs` runs after one warm-up (CPU time is less disturbed by other processes on a shared machine). */
function time(task: () => unknown, runs: number): { wall: number; cpu: number } {
  task();
  const walls: number[] = [];
  const cpus: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t = performance.now(), c = cpuMs();
    task();
    walls.push(performance.now() - t);
    cpus.push(cpuMs() - c);
  }
  const mid = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(runs / 2)]!;
  return { wall: mid(walls), cpu: mid(cpus) };
}

const one = time(() => analyseDocument(doc), 200);
const setup = time(() => startUncertainty(doc, { samples: 10_000, seed: 1 }), 5);
const sampled = startUncertainty(doc, { samples: 10_000, seed: 1 });
sampled.step(10_000);
const summary = time(() => sampled.result(), 5);
const fast = time(() => analyseUncertainty(doc, { samples: 10_000, seed: 1 }), 5);
const full = time(() => analyseUncertainty(doc, { samples: 10_000, seed: 1, full: true }), 3);
const row = (name: string, t: { wall: number; cpu: number }, note = '') => console.log(`${name.padEnd(32)} ${t.wall.toFixed(1).padStart(8)} ms wall ${t.cpu.toFixed(1).padStart(8)} ms CPU   ${note}`);
console.log('50-point cycle, 50 inputs with σ, 10 000 samples (median of runs)');
row('one point-estimate analysis', { wall: one.wall, cpu: one.cpu }, '');
row('  setup (inputs, columns, check)', setup);
row('  summaries (percentiles, shares)', summary);
row('fast path, whole run', fast, `${(fast.wall / one.wall).toFixed(0)}× one analysis; ${fast.wall < 1000 ? 'under' : 'OVER'} the 1 s target (issue 18)`);
row('full pipeline per sample', full, `${(full.wall / fast.wall).toFixed(2)}× the fast path`);
