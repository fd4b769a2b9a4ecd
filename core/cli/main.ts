import { parseArgs } from 'node:util';
import { readFileSync } from 'node:fs';
import { CliError, EXIT_OK, EXIT_USAGE, type CliIo } from './io.ts';
import { commandHelp, HELP, VERSION } from './help.ts';
import { attachNegativeValues } from './negativeValues.ts';
import { expectLongWork } from './compilerTier.ts';
import { readUtf8, terminalWriter } from './terminal.ts';

/** The real terminal and filesystem. */
export const nodeIo: CliIo = {
  out: terminalWriter(process.stdout),
  err: terminalWriter(process.stderr),
  readFile: readUtf8,
  readBytes: (path) => new Uint8Array(readFileSync(path)),
  // Loaded on first write: it needs node:crypto, which `--version` or `analyze` never do.
  writeFile: async (path, data) => (await import('../io/atomicWrite.node.ts')).atomicWrite(path, data),
};

type Command = (positionals: string[], values: Record<string, string | boolean | string[] | undefined>, io: CliIo) => void | Promise<void>;
type OptionSpec = { type: 'string' | 'boolean'; multiple?: boolean; short?: string };
type Values = Record<string, string | boolean | string[] | undefined>;

/**
 * One entry per command: its options, how many file arguments it takes ('many' = one or
 * more) and a `run` that imports the command's module only when that command runs, so
 * `passline --version` or `analyze` never load the PDF writer, the rasteriser or the solver.
 * Its help text is the entry of the same name in COMMAND_HELP (help.ts). `long` says when a
 * run computes for long enough to want V8's optimising compiler (compilerTier.ts).
 */
const COMMANDS: Record<string, { options: Record<string, OptionSpec>; run: Command; args: number | 'many'; long?: (files: string[], values: Values) => boolean }> = {
  species: {
    options: { json: { type: 'boolean' }, temperature: { type: 'string' }, 'quasi-harmonic': { type: 'string' }, cutoff: { type: 'string' } },
    args: 'many',
    run: async (files, v, io) => (await import('./species.ts')).runSpecies(files, { json: v.json as boolean | undefined, temperature: v.temperature as string | undefined, quasiHarmonic: v['quasi-harmonic'] as string | undefined, cutoff: v.cutoff as string | undefined }, io),
  },
  analyze: {
    options: { json: { type: 'boolean' }, unit: { type: 'string' }, temperature: { type: 'string' }, strict: { type: 'boolean' }, uncertainty: { type: 'string' }, seed: { type: 'string' } },
    args: 1,
    run: async ([file], v, io) => (await import('./analyze.ts')).runAnalyze(file!, { json: v.json as boolean | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined, strict: v.strict as boolean | undefined, uncertainty: v.uncertainty as string | undefined, seed: v.seed as string | undefined }, io),
  },
  thermo: {
    options: { json: { type: 'boolean' }, reaction: { type: 'string' }, temperature: { type: 'string' }, solve: { type: 'string' }, given: { type: 'string' } },
    args: 1,
    run: async ([file], v, io) => (await import('./thermo.ts')).runThermo(file!, { json: v.json as boolean | undefined, reaction: v.reaction as string | undefined, temperature: v.temperature as string | undefined, solve: v.solve as string | undefined, given: v.given as string | undefined }, io),
  },
  simulate: {
    options: { species: { type: 'boolean' }, until: { type: 'string' }, points: { type: 'string' }, init: { type: 'string', multiple: true }, pathway: { type: 'string' }, temperature: { type: 'string' } },
    args: 1,
    long: () => true,
    run: async ([file], v, io) => (await import('./simulate.ts')).runSimulate(file!, { species: v.species as boolean | undefined, until: v.until as string | undefined, points: v.points as string | undefined, init: v.init as string[] | undefined, pathway: v.pathway as string | undefined, temperature: v.temperature as string | undefined }, io),
  },
  render: {
    options: { output: { type: 'string', short: 'o' }, 'out-dir': { type: 'string' }, format: { type: 'string' }, watch: { type: 'boolean' }, 'width-mm': { type: 'string' }, preset: { type: 'string' }, theme: { type: 'string' }, dpi: { type: 'string' }, unit: { type: 'string' }, temperature: { type: 'string' }, strict: { type: 'boolean' } },
    args: 'many',
    long: (files, v) => files.length > 2 || v.watch === true,
    run: async (files, v, io) => (await import('./renderCommand.ts')).runRenderCommand(files, { outDir: v['out-dir'] as string | undefined, format: v.format as string | undefined, watch: v.watch as boolean | undefined }, { output: v.output as string | undefined, widthMm: v['width-mm'] as string | undefined, preset: v.preset as string | undefined, theme: v.theme as string | undefined, dpi: v.dpi as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined, strict: v.strict as boolean | undefined }, io),
  },
  scan: {
    options: { from: { type: 'string' }, to: { type: 'string' }, count: { type: 'string' } },
    args: 1,
    long: () => true,
    run: async ([file], v, io) => (await import('./scan.ts')).runScan(file!, { from: v.from as string | undefined, to: v.to as string | undefined, count: v.count as string | undefined }, io),
  },
  report: {
    options: { output: { type: 'string', short: 'o' }, unit: { type: 'string' }, temperature: { type: 'string' }, uncertainty: { type: 'string' }, seed: { type: 'string' } },
    args: 1,
    run: async ([file], v, io) => (await import('./report.ts')).runReport(file!, { output: v.output as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined, uncertainty: v.uncertainty as string | undefined, seed: v.seed as string | undefined }, io),
  },
  tables: {
    options: { output: { type: 'string', short: 'o' }, unit: { type: 'string' }, temperature: { type: 'string' }, uncertainty: { type: 'string' }, seed: { type: 'string' } },
    args: 1,
    run: async ([file], v, io) => (await import('./report.ts')).runTables(file!, { output: v.output as string | undefined, unit: v.unit as string | undefined, temperature: v.temperature as string | undefined, uncertainty: v.uncertainty as string | undefined, seed: v.seed as string | undefined }, io),
  },
};

/** Runs the CLI with the given arguments; returns the exit code. Never throws for user errors. */
export async function main(argv: string[], io: CliIo = nodeIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === 'help' && rest[0] !== undefined && Object.hasOwn(COMMANDS, rest[0])) {
    io.out(commandHelp(rest[0]));
    return EXIT_OK;
  }
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(HELP);
    return name === undefined ? EXIT_USAGE : EXIT_OK;
  }
  if (name === '--version' || name === '-v') {
    io.out(`passline ${VERSION}\n`);
    return EXIT_OK;
  }
  const command = Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
  if (!command) {
    io.err(`passline: unknown command "${name}" (try passline --help)\n`);
    return EXIT_USAGE;
  }
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: attachNegativeValues(rest, command.options), options: { ...command.options, help: { type: 'boolean', short: 'h' } }, allowPositionals: true, strict: true });
    } catch (error) {
      throw new CliError(`${(error as Error).message.split('\n')[0]} (try passline ${name} --help)`, EXIT_USAGE);
    }
    if (parsed.values.help) { io.out(commandHelp(name)); return EXIT_OK; }
    const count = parsed.positionals.length;
    if (command.args === 'many' ? count === 0 : count !== command.args) {
      const wanted = command.args === 'many' ? 'one or more file arguments' : `${command.args} file argument${command.args === 1 ? '' : 's'}`;
      throw new CliError(`${name}: expected ${wanted}, got ${count} (try passline ${name} --help)`, EXIT_USAGE);
    }
    if (command.long?.(parsed.positionals, parsed.values)) expectLongWork();
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
