/**
 * Whole-document analysis timings (npx tsx tests/bench/resolveBench.ts): parse + validate,
 * resolve, and analyse (steps, effective barrier, energetic span) one catalytic cycle of
 * N = 10³, 10⁴, 10⁵ points, with the time ratio per decade (≈10× means linear). Prints
 * numbers; not a test.
 */
import { analyseDocument } from '../../core/analysis/analyseDocument.ts';
import { parseDocument, serializeDocument, makeDocument } from '../../core/model/load.ts';
import { resolveProfile } from '../../core/profile/resolve.ts';

// Invented cycle: alternating minima and TSs on a slow downhill zig-zag, closed by a minimum.
function cycleText(n: number): string {
  const points = Array.from({ length: n }, (_, i) => ({
    id: `p${i}`, label: i % 2 ? `T${i}` : `I${i}`, kind: (i % 2 ? 'ts' : 'min') as 'ts' | 'min',
    energy: { mode: 'value' as const, value: (i % 2 ? 14 : 0) + 3 * Math.sin(i) - i * 1e-3, unit: 'kcal/mol' as const },
  }));
  points.push({ id: 'end', label: 'I0′', kind: 'min', energy: { mode: 'value', value: -n * 1e-3 - 1, unit: 'kcal/mol' } });
  return serializeDocument(makeDocument({ pathways: [{ id: 'c', name: 'bench cycle', cycle: true, points }] }));
}

function time(task: () => unknown, runs = 5): number {
  task();
  const times: number[] = [];
  for (let r = 0; r < runs; r++) { const t = performance.now(); task(); times.push(performance.now() - t); }
  return times.sort((a, b) => a - b)[Math.floor(runs / 2)]!;
}

let previous: number | undefined;
console.log('N points    parse+validate   resolve     analyse     total      ratio per decade');
for (const n of [1_000, 10_000, 100_000]) {
  const text = cycleText(n);
  const parsed = parseDocument(text);
  if (!parsed.ok) throw new Error('bench document must load');
  const tParse = time(() => parseDocument(text), 3);
  const tResolve = time(() => resolveProfile(parsed.doc));
  const tAnalyse = time(() => analyseDocument(parsed.doc));
  const total = tParse + tAnalyse;
  console.log(`${String(n).padEnd(11)} ${tParse.toFixed(1).padStart(9)} ms ${tResolve.toFixed(1).padStart(9)} ms ${tAnalyse.toFixed(1).padStart(9)} ms ${total.toFixed(1).padStart(9)} ms   ${previous ? `${(total / previous).toFixed(1)}×` : '—'}`);
  previous = total;
}
