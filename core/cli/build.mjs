// Bundles the CLI (core/cli/bin.ts) into dist/cli/passline.mjs with esbuild; run by `npm install`
// and `npm ci` (the `prepare` script) and by the test setup. Each command's module becomes
// its own chunk, loaded only when that command runs. Native and WebAssembly packages stay
// outside the bundle and load from node_modules when used. The bundle must stay two folders
// below the checkout, beside its chunks: modules find assets/fonts as ../../assets from
// their own file.
import { build } from 'esbuild';
import { chmodSync, existsSync, rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
const outdir = `${root}dist/cli`;
rmSync(outdir, { recursive: true, force: true });
await build({
  absWorkingDir: root,
  entryPoints: { passline: 'core/cli/bin.ts' },
  outdir,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  minify: true,
  legalComments: 'linked',
  chunkNames: '[name]-[hash]',
  // .mjs: read as ES modules wherever the folder is, without a package.json lookup.
  outExtension: { '.js': '.mjs' },
  // Native (resvg) and optional browser-only packages of jsPDF, which the CLI never calls.
  external: ['@resvg/resvg-js', 'canvg', 'html2canvas', 'dompurify', 'core-js'],
  banner: { js: '#!/usr/bin/env node\nimport { createRequire as __cr } from "node:module"; const require = __cr(import.meta.url);' },
  logLevel: 'warning',
});
chmodSync(`${outdir}/passline.mjs`, 0o755);
if (!existsSync(new URL('../../assets/fonts/DejaVuSans.ttf', `file://${outdir}/passline.mjs`))) throw new Error('build.mjs: the bundle cannot see assets/fonts from dist/cli');
