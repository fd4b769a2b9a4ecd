import { execFileSync } from 'node:child_process';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { BIN, ROOT } from './cliBin.ts';

function newestSource(folder: string): number {
  let newest = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const path = join(folder, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(path) : statSync(path).mtimeMs);
  }
  return newest;
}

/**
 * Vitest global setup: tests that run the installed `passline` need the bundle; build it
 * when it is missing or older than a source file under core/ (`npm ci` builds it too).
 */
export default function setup(): void {
  let built = 0;
  try { built = statSync(BIN).mtimeMs; } catch { /* not built yet */ }
  if (built > Math.max(newestSource(`${ROOT}core`), statSync(`${ROOT}package.json`).mtimeMs)) return;
  execFileSync(process.execPath, [`${ROOT}core/cli/build.mjs`], { stdio: 'inherit' });
}
