import { describe, expect, it } from 'vitest';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { ONE_BARRIER_DOC } from './oneBarrierDoc.ts';
import { rtJoules } from '../../../core/units/thermal.ts';

const DOC = ONE_BARRIER_DOC;

async function run(argv: string[], doc = DOC) {
  let out = '', err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => doc, readBytes: () => new Uint8Array(), writeFile: () => {} };
  return { code: await main(argv, io), out, err };
}

describe('passline analyze --uncertainty', () => {
  it('--json puts { median, low, high } beside each quantity and states N, seed and the input σ', async () => {
    const { code, out } = await run(['analyze', 'x.passline', '--uncertainty', '20000', '--seed', '3', '--json']);
    expect(code).toBe(0);
    const report = JSON.parse(out);
    expect(report.uncertainty).toMatchObject({ samples: 20000, seed: 3, inputs: [{ input: 'TS (A): barrier', sigma: 1, unit: 'kcal/mol', default: false }] });
    const step = report.pathways[0].steps[0];
    // Log-normal k (Eyring–Polanyi with a normal barrier): 97.5 % point k₀·exp(1.959964 σ/RT); Monte Carlo tolerance ±0.1 in ln k.
    const lnRatio = Math.log(step.uncertainty.kForward.high / step.kForward);
    expect(Math.abs(lnRatio - 1.959964 * 4184 / rtJoules(298.15))).toBeLessThan(0.1);
    expect(step.uncertainty.barrierForward.median).toBeCloseTo(20, 1);
    expect(report.pathways[0].effectiveBarrier.uncertainty.value.low).toBeLessThan(20);
  });

  it('text output names N, the seed and σ of every input', async () => {
    const { code, out } = await run(['analyze', 'x.passline', '--uncertainty', '500']);
    expect(code).toBe(0);
    expect(out).toContain('N = 500 samples, seed 1');
    expect(out).toContain('TS (A): barrier 1 kcal mol⁻¹');
    expect(out).toMatch(/effective barrier 20\.\d \[1\d\.\d, 2\d\.\d\] kcal mol⁻¹/);
  });

  it('bad counts and a seed without --uncertainty are usage errors that name the option', async () => {
    expect(await run(['analyze', 'x.passline', '--uncertainty', 'many'])).toMatchObject({ code: 2, err: expect.stringContaining('--uncertainty: expected a whole number') });
    expect(await run(['analyze', 'x.passline', '--seed', '4'])).toMatchObject({ code: 2, err: expect.stringContaining('--seed needs --uncertainty') });
  });
});

// Invented profile: a barrier from a measured k = 1.5e-3 s⁻¹ ± 20 % at 298.15 K, and one from an Eyring plot with σ on each k.
const RATE_DOC = JSON.stringify({
  format: 'passline', version: 3, title: 'barriers from measured rates',
  pathways: [{ id: 'a', name: 'A', points: [
    { id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
    { id: 't1', label: 'TS1', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'rateConstant', k: 1.5e-3, kSigma: 3e-4 } } },
    { id: 'i', label: 'I', kind: 'min', energy: { mode: 'value', value: -4, unit: 'kcal/mol' } },
    { id: 't2', label: 'TS2', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'eyringFit', data: [
      { temperatureK: 290, k: 2e-4, kSigma: 2e-5 }, { temperatureK: 310, k: 1.6e-3, kSigma: 1.6e-4 }, { temperatureK: 330, k: 1.0e-2, kSigma: 1e-3 }] } } },
    { id: 'p', label: 'P', kind: 'min', energy: { mode: 'value', value: -9, unit: 'kcal/mol' } },
  ] }],
});

describe('passline analyze --uncertainty with σ on rate constants', () => {
  it('--json gives the barriers from k and from the Eyring plot their intervals, and names the log-normal inputs', async () => {
    const { code, out } = await run(['analyze', 'x.passline', '--uncertainty', '20000', '--seed', '5', '--json'], RATE_DOC);
    expect(code).toBe(0);
    const report = JSON.parse(out);
    expect(report.uncertainty.method).toContain('log-normal for rate constants and half-lives');
    expect(report.uncertainty.inputs.map((i: { key: string; unit: string }) => [i.key, i.unit])).toEqual([['a/t1/k', 's⁻¹'], ['a/t2/data 0/k', 's⁻¹'], ['a/t2/data 1/k', 's⁻¹'], ['a/t2/data 2/k', 's⁻¹']]);
    // Eyring–Polanyi: Δ‡G = RT ln(k_BT/(hk)) with ln k ~ N(ln k₀, 0.2²): 95 % interval Δ‡G₀ ∓ 1.959964·RT·0.2, in kcal/mol; MC tolerance 0.02 kcal/mol.
    const [s1, s2] = report.pathways[0].steps;
    const half = 1.959964 * rtJoules(298.15) * 0.2 / 4184;
    expect(Math.abs(s1.uncertainty.barrierForward.high - s1.barrierForward - half)).toBeLessThan(0.02);
    expect(Math.abs(s1.barrierForward - s1.uncertainty.barrierForward.low - half)).toBeLessThan(0.02);
    expect(s2.uncertainty.barrierForward.low).toBeLessThan(s2.barrierForward);
    expect(s2.uncertainty.barrierForward.high).toBeGreaterThan(s2.barrierForward);
  });

  it('text output states each σ in the unit of k', async () => {
    const { code, out } = await run(['analyze', 'x.passline', '--uncertainty', '300'], RATE_DOC);
    expect(code).toBe(0);
    expect(out).toContain('TS1 (A): rate constant k 0.0003 s⁻¹');
    expect(out).toContain('TS2 (A): k at 290 K 0.00002 s⁻¹');
  });
});
