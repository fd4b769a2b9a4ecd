import { importCalculations, type CalcImport } from '../import/calc/importCalculations.ts';
import { imaginaryCount } from '../import/calc/calcRecord.ts';
import type { SpeciesCandidate } from '../import/calc/speciesFromCalc.ts';
import { outsideHard } from '../model/bounds.ts';
import type { QuasiHarmonicMethod } from '../thermo/rrho/quasiHarmonic.ts';
import { fromJoulesPerMol } from '../units/energy.ts';
import { CliError, EXIT_INPUT, EXIT_USAGE, type CliIo } from './io.ts';

export interface SpeciesOptions {
  json?: boolean | undefined;
  temperature?: string | undefined;
  quasiHarmonic?: string | undefined;
  cutoff?: string | undefined;
}

function numberOption(name: string, text: string | undefined, fallback: number, bound: 'temperatureK' | 'lowModeCutoffCm1'): number {
  if (text === undefined) return fallback;
  const value = Number(text);
  const problem = text.trim() === '' ? 'expected a number' : outsideHard(bound, value);
  if (problem) throw new CliError(`--${name}: ${problem}, got "${text}"`, EXIT_USAGE);
  return value;
}

const hartree = (j: number) => fromJoulesPerMol(j, 'hartree');

/** The JSON of one file: what was read, the program's corrections and the recomputed ones. */
function fileJson(name: string, result: CalcImport) {
  const candidate = result.candidates.find((c) => c.correctionFile?.name === name) ?? result.candidates.find((c) => c.energyFile.name === name)!;
  const file = candidate.energyFile.name === name ? candidate.energyFile : candidate.correctionFile!;
  const r = file.record;
  const rrho = candidate.correctionFile?.name === name ? candidate.rrho : null;
  return {
    file: name, program: r.program, version: r.version, method: r.method, charge: r.charge, multiplicity: r.multiplicity, formula: r.formula,
    electronicEnergyHartree: r.energyHartree, energyLabel: r.energyLabel,
    programCorrections: r.thermo && { temperatureK: r.thermo.temperatureK, pressureAtm: r.thermo.pressureAtm, zpeHartree: r.thermo.zpe, eCorrectionHartree: r.thermo.eCorrection, hCorrectionHartree: r.thermo.hCorrection, gCorrectionHartree: r.thermo.gCorrection, entropyModel: r.thermo.entropyModel },
    frequenciesCm1: r.frequencies, imaginaryCount: imaginaryCount(r), symmetryNumber: r.symmetryNumber,
    termination: r.termination, optimisation: r.optimisation,
    recomputed: rrho && { zpeHartree: hartree(rrho.zpe), hCorrectionHartree: hartree(rrho.enthalpy), entropyJPerMolK: rrho.entropy, gCorrectionHartree: hartree(rrho.gibbs), method: rrho.method },
    missing: r.missing, notes: r.notes,
  };
}

const fixed = (v: number | undefined, d: number) => (v === undefined ? '—' : v.toFixed(d));

function row(c: SpeciesCandidate): string[] {
  const s = c.species.structures[0]!;
  const files = c.correctionFile && c.correctionFile !== c.energyFile ? `${c.energyFile.name} + ${c.correctionFile.name}` : c.energyFile.name;
  const method = [c.energyFile.record.method, c.correctionFile && c.correctionFile !== c.energyFile ? c.correctionFile.record.method : null].filter(Boolean).join(' // ') || '—';
  const end = [...new Set([c.energyFile, c.correctionFile].filter((f) => f !== null).map((f) => f.record.termination))].join('/');
  return [c.species.id, files, c.energyFile.record.program, method, fixed(s.singlePoint ?? s.electronic, 6), fixed(s.hCorrection, 6), fixed(s.gCorrection, 6), c.imaginary === null ? '—' : String(c.imaginary), end];
}

function table(rows: string[][]): string {
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  return rows.map((r) => r.map((cell, i) => cell.padEnd(widths[i]!)).join('  ').trimEnd()).join('\n');
}

/**
 * `passline species FILE...`: reads Gaussian logs, ORCA outputs and XYZ files into species
 * (single point + frequency pairs by file name), recomputes the thermal corrections at the
 * temperature asked, and prints the review table (or `--json`: per file what was read, the
 * program's corrections with their T and p, and the recomputed H, S, G with the method).
 */
export function runSpecies(paths: string[], options: SpeciesOptions, io: CliIo): void {
  const temperatureK = numberOption('temperature', options.temperature, 298.15, 'temperatureK');
  const cutoffCm1 = numberOption('cutoff', options.cutoff, 100, 'lowModeCutoffCm1');
  const method = (options.quasiHarmonic ?? 'off') as QuasiHarmonicMethod;
  if (!['off', 'grimme', 'truhlar'].includes(method)) throw new CliError(`--quasi-harmonic: expected grimme, truhlar or off, got "${options.quasiHarmonic}"`, EXIT_USAGE);
  const unreadable: string[] = [];
  const files: { name: string; text: string }[] = [];
  for (const path of paths) {
    try { files.push({ name: path, text: io.readFile(path) }); } catch (error) { unreadable.push(`cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`); }
  }
  const result = importCalculations(files, { temperatureK, pressure: '1atm', quasiHarmonic: { method, cutoffCm1 } });
  const errors = [...unreadable, ...result.errors.filter((e) => !unreadable.includes(e))];
  if (options.json) {
    const readable = result.candidates.flatMap((c) => [c.energyFile.name, ...(c.correctionFile && c.correctionFile !== c.energyFile ? [c.correctionFile.name] : [])]);
    io.out(`${JSON.stringify({
      temperatureK, pressureAtm: 1, quasiHarmonic: method, cutoffCm1,
      files: files.map((f) => f.name).filter((n) => readable.includes(n)).map((n) => fileJson(n, result)),
      species: result.candidates.map((c) => ({ id: c.species.id, formula: c.species.formula ?? null, structure: c.species.structures[0], correctionTemperatureK: c.species.correctionTemperatureK ?? null, warnings: c.warnings })),
      errors,
    }, null, 2)}\n`);
  } else {
    const header = ['species', 'file(s)', 'program', 'method', 'E / Eh', 'H corr / Eh', 'G corr / Eh', 'imag.', 'end'];
    io.out(`Species at ${temperatureK} K, 1 atm; low modes: ${method === 'off' ? 'harmonic' : `${method}, ${cutoffCm1} cm⁻¹`}\n`);
    io.out(`${table([header, ...result.candidates.map(row)])}\n`);
    for (const c of result.candidates) for (const w of c.warnings) io.out(`  note: ${w}\n`);
    for (const c of result.candidates) if (c.species.structures[0]?.source?.corrections) io.out(`  ${c.species.id}: corrections ${c.species.structures[0].source.corrections}\n`);
  }
  if (errors.length > 0) {
    for (const e of errors) io.err(`passline species: ${e}\n`);
    throw new CliError(`${errors.length} file${errors.length === 1 ? '' : 's'} could not be used`, EXIT_INPUT);
  }
}
