import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BIN, ROOT } from './cliBin.ts';

// V8's --trace-opt prints a "completed optimizing" line for every function TurboFan compiles,
// so it shows whether the bundle left the optimising compiler off (core/cli/compilerTier.ts).
function turbofanCompiles(args: readonly string[]): number {
  const run = spawnSync(process.execPath, ['--trace-opt', BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 });
  expect(run.status).toBe(0);
  return (run.stdout.match(/completed optimizing/g) ?? []).length;
}

describe('the bundled CLI and V8 optimising compiler', { timeout: 60_000 }, () => { // real processes on a shared machine
  it('a short run (a small table drawn to PDF, ~20 TurboFan compiles without the switch) compiles nothing with TurboFan', () => {
    const out = join(mkdtempSync(join(tmpdir(), 'passline-tier-')), 'fig.pdf');
    expect(turbofanCompiles(['render', 'tests/bench/smallProfile.csv', '-o', out])).toBe(0);
    expect(turbofanCompiles(['analyze', 'tests/bench/smallProfile.csv', '--json'])).toBe(0);
  });

  it('a Monte Carlo run (analyze or tables --uncertainty, through monteCarlo.ts) turns it back on, so its hot loop is optimised', () => {
    expect(turbofanCompiles(['analyze', 'tests/bench/smallProfile.csv', '--uncertainty', '3000', '--json'])).toBeGreaterThan(0);
    const tables = join(mkdtempSync(join(tmpdir(), 'passline-tier-')), 't.md');
    expect(turbofanCompiles(['tables', 'tests/bench/smallProfile.csv', '-o', tables, '--uncertainty', '3000'])).toBeGreaterThan(0);
  });
});
