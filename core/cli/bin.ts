// Entry point of the bundled CLI (built by core/cli/build.mjs into dist/cli/passline.mjs).
import { main } from './main.ts';

process.exitCode = await main(process.argv.slice(2));
