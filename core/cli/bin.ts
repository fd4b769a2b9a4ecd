// Entry point of the bundled CLI (built by core/cli/build.mjs into dist/cli/passline.mjs).
import { startShortRun } from './compilerTier.ts';
import { main } from './main.ts';

startShortRun();
process.exitCode = await main(process.argv.slice(2));
