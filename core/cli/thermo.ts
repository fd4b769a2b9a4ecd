import { thermoReport } from '../thermo/thermoReport.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { boundedOption } from './options.ts';
import { solveFormation, solvedLine } from './thermoSolve.ts';
import { readText } from './readText.ts';

export interface ThermoOptions {
  reaction?: string | undefined;
  temperature?: string | undefined;
  json?: boolean | undefined;
  solve?: string | undefined;
  given?: string | undefined;
}

const num = (v: number | null, digits: number) => (v === null ? '—' : v.toFixed(digits));

/** `passline thermo TABLE --reaction "..."`: Hess's-law reaction thermochemistry from formation data. */
export function runThermo(tablePath: string, options: ThermoOptions, io: CliIo): void {
  if (!options.reaction) throw new CliError('thermo: --reaction "A + B -> C" is required', EXIT_USAGE);
  const temperatureK = boundedOption('temperature', options.temperature, 'temperatureK', 298.15);
  const text = readText(tablePath, io);
  if (options.solve !== undefined || options.given !== undefined) {
    if (!options.solve || !options.given) throw new CliError('thermo: --solve SPECIES and --given dH=VALUE go together', EXIT_USAGE);
    const solved = solveFormation(text, options.reaction, options.solve, options.given);
    io.out(options.json ? `${JSON.stringify(solved, null, 2)}\n` : solvedLine(solved));
    return;
  }
  const report = thermoReport(text, options.reaction, temperatureK);
  if (!report.ok) throw new CliError(`${tablePath}: ${report.message}`);
  const r = report.result;
  if (options.json) {
    const { warnings, ...numbers } = r;
    io.out(`${JSON.stringify({ ...numbers, warnings }, null, 2)}\n`);
    return;
  }
  io.out([
    `${options.reaction}   at ${r.temperatureK} K`,
    `  ΔrH°              ${num(r.dH, 3)} kJ mol⁻¹`,
    `  ΔrS°              ${num(r.dS, 3)} J mol⁻¹ K⁻¹`,
    `  ΔrG° (ΔH − TΔS)   ${num(r.dG, 3)} kJ mol⁻¹`,
    `  ΔrG° (Σ ΔfG°)     ${num(r.dGfromFormation, 3)} kJ mol⁻¹`,
    `  K                 ${r.K === null ? '—' : r.K.toPrecision(6)}   (from ${r.KBasis === 'dH-TdS' ? 'ΔrH° − TΔrS°' : 'Σ ΔfG°'}; K refers to the formation table's standard state)`,
    `  crossover T       ${r.crossoverK === null ? '—' : `${r.crossoverK.toFixed(1)} K`}`,
    ...r.warnings.map((w) => `  note: ${w}`),
    '',
  ].join('\n'));
}
