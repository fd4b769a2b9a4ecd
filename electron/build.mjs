// Bundles the Electron main process (ES module) and the preload script (CommonJS, because
// a sandboxed preload cannot load ES modules or other files) into electron/dist/.
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const shared = { bundle: true, platform: 'node', target: 'node22', external: ['electron'], sourcemap: true, logLevel: 'info', absWorkingDir: here };

await build({ ...shared, entryPoints: ['main.ts'], outfile: 'dist/main.js', format: 'esm' });
await build({ ...shared, entryPoints: ['preload.ts'], outfile: 'dist/preload.cjs', format: 'cjs' });
