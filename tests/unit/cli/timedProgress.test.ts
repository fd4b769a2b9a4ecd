import { describe, expect, it } from 'vitest';
import { timedProgress } from '../../../core/cli/largeWork.ts';
import type { CliIo } from '../../../core/cli/io.ts';

describe('timedProgress', () => {
  it('is silent for the first second, then writes at most one line a second', () => {
    let clock = 0;
    const lines: string[] = [];
    const report = timedProgress('simulate', { err: (text: string) => lines.push(text) } as unknown as CliIo, 'the output times', () => clock);
    clock = 400; report(10, 100);
    clock = 999; report(20, 100);
    expect(lines).toEqual([]);
    clock = 1000; report(30, 100);
    clock = 1500; report(40, 100);
    clock = 2100; report(557, 1000);
    expect(lines).toEqual(['passline simulate: 30 % of the output times done\n', 'passline simulate: 55 % of the output times done\n']);
  });
});
