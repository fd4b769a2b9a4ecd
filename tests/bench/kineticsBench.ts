/**
 * Timing of the full kinetic analysis of one pathway (steps + effective barrier + energetic
 * span) at N = 10² … 10⁵ points. Run: npx tsx tests/bench/kineticsBench.ts. Prints numbers;
 * it is not a test. Linear algorithms give a time ratio near 10 per decade. At 10⁵ points the
 * full analysis allocates ~0.5 M result objects, and V8's promotion of them out of the young
 * generation adds to the ratio; `NODE_OPTIONS=--max-semi-space-size=256` shows the
 * algorithmic ratio. The second table times the log-space span kernel alone (typed arrays).
 */
import { analyseSteps, effectiveBarrier, energeticSpan, largestSpan, spanSums } from '../../core/kinetics/index.ts';
import type { ResolvedPathway, ResolvedPoint } from '../../core/profile/types.ts';

/** An invented cycle of n points (I, T alternating, closed by I1′), energies in J/mol. */
function syntheticCycle(n: number): ResolvedPathway {
  const points: ResolvedPoint[] = [];
  const steps = Math.floor((n - 1) / 2);
  for (let i = 0; i < steps; i++) {
    const base = -250 * i;
    points.push(point(`I${i + 1}`, 'min', base), point(`T${i + 1}`, 'ts', base + 40000 + 30000 * Math.abs(Math.sin(i))));
  }
  points.push(point('I1′', 'min', -250 * steps - 5000));
  return { id: 'bench', name: 'bench', cycle: true, points };
}

function point(id: string, kind: 'min' | 'ts', energyJ: number): ResolvedPoint {
  return { id, label: id, kind, energyJ, provenance: { route: 'typed', detail: 'bench', approximations: [] } };
}

function analyse(p: ResolvedPathway): number {
  const options = { temperatureK: 298.15 };
  const steps = analyseSteps(p, options).steps.length;
  const barrier = effectiveBarrier(p).result?.barrierJ ?? NaN;
  const tof = energeticSpan(p, options).span?.tof ?? NaN;
  return steps + barrier + tof;
}

/** Fastest of several runs after one untimed run (JIT, heap growth); the minimum is the least disturbed by other load. */
function timeMs(run: () => number, size: number): number {
  const runs = Math.max(7, Math.round(2e5 / size));
  run();
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    const sink = run();
    times.push(performance.now() - start);
    if (!Number.isFinite(sink)) throw new Error('analysis gave a non-finite result');
  }
  return Math.min(...times);
}

function table(title: string, measure: (n: number) => number): void {
  console.log(`\n${title}\npoints    ms/run        ratio to previous decade`);
  let previous: number | null = null;
  for (const n of [1e2, 1e3, 1e4, 1e5]) {
    const ms = measure(n);
    console.log(`${String(n).padStart(6)}  ${ms.toFixed(4).padStart(12)}   ${previous === null ? '—' : (ms / previous).toFixed(1)}`);
    previous = ms;
  }
}

table('full analysis (steps + effective barrier + energetic span)', (n) => {
  const p = syntheticCycle(n + 1);
  return timeMs(() => analyse(p), n);
});

table('span kernel (log-space prefix sums + largest span)', (n) => {
  const half = n / 2;
  const t = Float64Array.from({ length: half }, (_, i) => 20 + 10 * Math.abs(Math.sin(i)) - 0.1 * i);
  const a = Float64Array.from({ length: half }, (_, i) => 0.1 * i);
  return timeMs(() => spanSums(t, a, -2).logTotal + largestSpan(t, a, -2).deltaEJ, n);
});
