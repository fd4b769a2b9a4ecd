// Benchmark (not a test): the stiff 10-step cycle of tests/fixtures/scipy/microkinetics.json
// (rate constants 1e-6…1e10 s⁻¹) integrated to 1e5 s at rtol 1e-6, target < 100 ms.
// Run: npx tsx tests/bench/microkineticsBench.ts   (also times SciPy Radau when python3 has scipy)
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { compileNetwork, integrate, networkFromReactions, type ReactionInput } from '../../core/kinetics/microkinetics/index.ts';

const RTOL = 1e-6;
const ATOL = 1e-15; // 1e-12 of the 1e-3 mol/L catalyst
const RUNS = 15;
const fixturePath = fileURLToPath(new URL('../fixtures/scipy/microkinetics.json', import.meta.url));
const problem = JSON.parse(readFileSync(fixturePath, 'utf8')).problems.stiffCycle as {
  reactions: ReactionInput[]; turnoverReaction: number; initial: number[]; times: number[]; states: number[][];
};
const built = networkFromReactions(problem.reactions);
if (!built.ok) throw new Error('fixture network is invalid');
built.network.turnoverReaction = problem.turnoverReaction;
const until = problem.times.at(-1)!;
const reference = problem.states.at(-1)!;

const median = (xs: number[]): number => { const s = [...xs].sort((a, b) => a - b); return s[Math.floor(s.length / 2)]!; };
const worstRelative = (y: ArrayLike<number>): number =>
  reference.reduce((w, r, i) => Math.max(w, Math.abs(y[i]! - r) / (Math.abs(r) + 1e-12 * problem.initial[0]!)), 0);

const ms: number[] = [];
let last: ReturnType<typeof integrate> | undefined;
for (let k = 0; k < RUNS; k++) {
  const start = performance.now();
  const net = compileNetwork(built.network);
  // Concentrations stay ≥ 0; the trailing turnover tally may go negative (net reverse flux at first).
  const nonNegative = problem.initial.map((_, i) => i !== net.tallyIndex);
  last = integrate(net.rhs, net.jacobian, problem.initial, 0, until, { rtol: RTOL, atol: ATOL, outputTimes: [until], nonNegative });
  ms.push(performance.now() - start);
}
if (!last || !last.ok) throw new Error(`integration failed: ${last && !last.ok ? last.error.message : ''}`);
const ours = median(ms);
console.log(`Passline RODAS3, 10-step stiff cycle to ${until} s, rtol ${RTOL}: median ${ours.toFixed(2)} ms over ${RUNS} runs (target < 100 ms)`);
console.log(`  steps ${last.stats.steps}, rejected ${last.stats.rejectedSteps}, Jacobians ${last.stats.jacobianEvaluations}, worst rel. deviation from the rtol-1e-10 SciPy fixture ${worstRelative(last.states[0]!).toExponential(2)}`);

const script = fileURLToPath(new URL('./scipyMicrokineticsBench.py', import.meta.url));
const hasScipy = spawnSync('python3', ['-c', 'import scipy'], { encoding: 'utf8' }).status === 0;
if (!hasScipy) {
  console.log('SciPy not available to python3; skipping the comparison.');
} else {
  const py = spawnSync('python3', [script, String(RTOL), String(ATOL), '7'], { encoding: 'utf8' });
  if (py.status !== 0) {
    console.log(`SciPy run failed: ${py.stderr.trim()}`);
  } else {
    const r = JSON.parse(py.stdout.trim().split('\n').at(-1)!) as { scipy: string; medianMs: number; steps: number; final: number[]; success: boolean };
    console.log(`SciPy ${r.scipy} solve_ivp Radau (analytic Jacobian), same problem and tolerances: median ${r.medianMs.toFixed(2)} ms, ${r.steps} steps, success ${r.success}`);
    console.log(`  worst rel. deviation from the fixture ${worstRelative(r.final).toExponential(2)}`);
    console.log(`  ratio SciPy / Passline = ${(r.medianMs / ours).toFixed(1)}`);
  }
}
