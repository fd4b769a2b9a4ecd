// Runs every benchmark in tests/bench and prints their numbers (not a test: nothing here
// passes or fails on time). Usage: npm run bench [-- NAME ...] to run only some.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv.slice(2);
const benches = readdirSync(here)
  .filter((f) => /Bench\.(ts|mjs)$/.test(f))
  .filter((f) => only.length === 0 || only.some((name) => f.startsWith(name)));
let failed = 0;
for (const file of benches) {
  console.log(`\n=== ${file} ===`);
  const runner = file.endsWith('.ts') ? ['npx', ['tsx', `${here}${file}`]] : ['node', [`${here}${file}`]];
  const result = spawnSync(runner[0], runner[1], { stdio: 'inherit' });
  if (result.status !== 0) { failed++; console.log(`(${file} exited with ${result.status})`); }
}
process.exit(failed > 0 ? 1 : 0);
