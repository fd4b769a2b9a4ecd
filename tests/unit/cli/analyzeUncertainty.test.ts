import { describe, expect, it } from 'vitest';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { ONE_BARRIER_DOC } from './oneBarrierDoc.ts';
import { rtJoules } from '../../../core/units/thermal.ts';

const DOC = ONE_BARRIER_DOC;

async function run(argv: string[]) {
  let out = '', err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => DOC, readBytes: () => new Uint8Array(), writeFile: () => {} };
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
