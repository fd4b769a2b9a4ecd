import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const child = fileURLToPath(new URL('./rewriteForever.ts', import.meta.url));

/** Starts the rewriting child on `target`, lets it run `ms` after it is ready, then kills it with SIGKILL. */
export async function killMidWrite(target: string, size: number, ms: number, mode: 'plain' | 'backup'): Promise<void> {
  const proc = spawn(process.execPath, ['--import', 'tsx', child, target, String(size), mode], { stdio: ['ignore', 'pipe', 'inherit'] });
  await new Promise<void>((resolve) => proc.stdout.once('data', () => resolve()));
  await new Promise((resolve) => setTimeout(resolve, ms));
  const exited = new Promise((resolve) => proc.once('exit', resolve));
  proc.kill('SIGKILL');
  await exited;
}

/** Kill delays (ms) spread over a few write cycles, with a small per-run jitter so runs probe different moments. */
export function killDelays(count: number): number[] {
  return Array.from({ length: count }, (_, i) => Math.round(i * 4.7 + Math.random() * 3));
}
