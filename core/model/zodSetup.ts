import * as z from 'zod';

// Zod compiles a fast path for each object schema with `new Function` on first parse. A
// document is parsed once per run, so that compile costs more than it saves (≈ 4 % of a CLI
// render, tests/bench/cliBench.mjs), and the app's Content-Security-Policy forbids eval
// anyway. Imported before any schema is built: zod reads the setting at construction.
z.config({ jitless: true });
