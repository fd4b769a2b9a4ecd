import { spawn, spawnSync, type SpawnSyncReturns } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** The checkout's root folder. */
export const ROOT = fileURLToPath(new URL('../../../', import.meta.url));

/** The installed command: package.json's `bin` (the bundle that the test setup builds). */
export const BIN = `${ROOT}${(JSON.parse(readFileSync(`${ROOT}package.json`, 'utf8')) as { bin: { passline: string } }).bin.passline}`;

/** Runs `passline ARGS` as a real process in `cwd`. */
export function passline(args: readonly string[], cwd = ROOT): SpawnSyncReturns<string> {
  return spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8', timeout: 60_000 });
}

/** Starts `passline ARGS` as a long-running process (for --watch), collecting its stderr. */
export function startPassline(args: readonly string[], cwd: string) {
  const child = spawn(process.execPath, [BIN, ...args], { cwd, stdio: ['ignore', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.setEncoding('utf8').on('data', (t: string) => { stderr += t; });
  const exited = new Promise<number | null>((done) => child.on('exit', (code) => done(code)));
  return { child, exited, stderr: () => stderr };
}
