#!/usr/bin/env node
// Runs the CLI from its TypeScript sources through tsx, for developers (npm run cli:src -- ARGS);
// the installed `passline` is the bundle that core/cli/build.mjs makes at npm install.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2));
