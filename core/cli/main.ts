import { parseArgs } from 'node:util';
import { readFileSync } from 'node:fs';
import { atomicWrite } from '../io/atomicWrite.node.ts';
import { CliError, EXIT_OK, EXIT_USAGE, type CliIo } from './io.ts';
import { runAnalyze } from './analyze.ts';
import { runThermo } from './thermo.ts';
import { runSimulate } from './simulate.ts';
import { runRender } from './render.ts';
import { runScan } from './scan.ts';
import { runReport, runTables } from './report.ts';
import { HELP, VERSION } from './help.ts';

/** The real terminal and filesystem. */
export const nodeIo: CliIo = {
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
  readFile: (path) => readFileSync(path, 'utf8'),
  readBytes: (path) => new Uint8Array(readFileSync(path)),
  writeFile: atomicWrite,
};

type Command = (positionals: string[], values: Record<string, string | boolean | string[] | undefined>, io: CliIo) => void | Promise<void>;
type OptionSpec = { type: 'string' | 'boolean'; multiple?: boolean; short?: string };

const COMMANDS: Record<string, { options: Record<string, OptionSpec>; run: Command; args: number }> = {
  analyze: {
    options: { json: { type: 'boolean' }, unit: { type: 'string' }, temperature: { type: 'string' }, uncertainty: { type: 'string' }, seed: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runAnalyze(file!, { json: v.json as boolean | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined, uncertainty: v.uncertainty as string | undefined, seed: v.seed as string | undefined }, io),
  },
  thermo: {
    options: { json: { type: 'boolean' }, reaction: { type: 'string' }, temperature: { type: 'string' }, solve: { type: 'string' }, given: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runThermo(file!, { json: v.json as boolean | undefined, reaction: v.reaction as string | undefined, temperature: v.temperature as string | undefined, solve: v.solve as string | undefined, given: v.given as string | undefined }, io),
  },
  simulate: {
    options: { species: { type: 'boolean' }, until: { type: 'string' }, points: { type: 'string' }, init: { type: 'string', multiple: true }, pathway: { type: 'string' }, temperature: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runSimulate(file!, { species: v.species as boolean | undefined, until: v.until as string | undefined, points: v.points as string | undefined, init: v.init as string[] | undefined, pathway: v.pathway as string | undefined, temperature: v.temperature as string | undefined }, io),
  },
  render: {
    options: { output: { type: 'string', short: 'o' }, 'width-mm': { type: 'string' }, preset: { type: 'string' }, theme: { type: 'string' }, dpi: { type: 'string' }, unit: { type: 'string' }, temperature: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runRender(file!, { output: v.output as string | undefined, widthMm: v['width-mm'] as string | undefined, preset: v.preset as string | undefined, theme: v.theme as string | undefined, dpi: v.dpi as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined }, io),
  },
  scan: {
    options: { from: { type: 'string' }, to: { type: 'string' }, count: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runScan(file!, { from: v.from as string | undefined, to: v.to as string | undefined, count: v.count as string | undefined }, io),
  },
  report: {
    options: { output: { type: 'string', short: 'o' }, unit: { type: 'string' }, temperature: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runReport(file!, { output: v.output as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined }, io),
  },
  tables: {
    options: { output: { type: 'string', short: 'o' }, unit: { type: 'string' }, temperature: { type: 'string' } },
    args: 1,
    run: ([file], v, io) => runTables(file!, { output: v.output as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined }, io),
  },
};

/** Runs the CLI with the given arguments; returns the exit code. Never throws for user errors. */
export async function main(argv: string[], io: CliIo = nodeIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(HELP);
    return name === undefined ? EXIT_USAGE : EXIT_OK;
  }
  if (name === '--version' || name === '-v') {
    io.out(`passline ${VERSION}\n`);
    return EXIT_OK;
  }
  const command = COMMANDS[name];
  if (!command) {
    io.err(`passline: unknown command "${name}" (try passline --help)\n`);
    return EXIT_USAGE;
  }
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: rest, options: { ...command.options, help: { type: 'boolean' } }, allowPositionals: true, strict: true });
    } catch (error) {
      throw new CliError(`${(error as Error).message.split('\n')[0]} (try passline --help)`, EXIT_USAGE);
    }
    if (parsed.values.help) { io.out(HELP); return EXIT_OK; }
    if (parsed.positionals.length !== command.args) {
      throw new CliError(`${name}: expected ${command.args} file argument${command.args === 1 ? '' : 's'}, got ${parsed.positionals.length} (try passline --help)`, EXIT_USAGE);
    }
    await command.run(parsed.positionals, parsed.values, io);
    return EXIT_OK;
  } catch (error) {
    if (error instanceof CliError) {
      io.err(`passline ${name}: ${error.message}\n`);
      return error.exitCode;
    }
    io.err(`passline ${name}: internal error: ${(error as Error).message}\n`);
    return 70;
  }
}
