import type { Species, SourceFile, Structure } from '../../model/schema.ts';
import { rrhoThermo, type RrhoResult } from '../../thermo/rrho/rrhoThermo.ts';
import type { QuasiHarmonic } from '../../thermo/rrho/quasiHarmonic.ts';
import { ATM_PA, BAR_PA } from '../../units/constants.ts';
import { fromJoulesPerMol } from '../../units/energy.ts';
import { imaginaryCount, type CalcRecord } from './calcRecord.ts';
import type { CalcFile, CalcPair } from './pairCalcFiles.ts';

/** Conditions for recomputed corrections: the document's temperature, standard pressure and low-mode treatment. */
export interface CalcConditions {
  temperatureK: number;
  /** Gas-phase standard state of the corrections: 1 atm (most programs' default) or 1 bar. */
  pressure: '1atm' | '1bar';
  quasiHarmonic: QuasiHarmonic;
}

/** One species as it would enter the document, with what the review table shows. */
export interface SpeciesCandidate {
  species: Species;
  energyFile: CalcFile;
  correctionFile: CalcFile | null;
  /** The recomputed thermochemistry (J/mol), when frequencies and a geometry allow it. */
  rrho: RrhoResult | null;
  imaginary: number | null;
  /** Problems that keep the species out (no energy); the import is all or nothing. */
  errors: string[];
  warnings: string[];
}

function sourceFile(f: CalcFile, role: SourceFile['role']): SourceFile {
  const r = f.record;
  return { file: f.name, role, program: r.version ?? r.program, ...(r.method ? { method: r.method } : {}), termination: r.termination, optimisation: r.optimisation };
}

const fileWarnings = (f: CalcFile) => [
  ...f.record.missing.map((m) => `${f.name}: missing ${m}`),
  ...f.record.notes.map((n) => `${f.name}: ${n}`),
  ...(f.record.termination === 'abnormal' ? [`${f.name}: the run ended with an error`] : []),
  ...(f.record.optimisation === 'not-converged' ? [`${f.name}: the optimisation did not converge`] : []),
];

const massesOf = (r: CalcRecord): 'standard' | 'isotope' => (r.program === 'orca' ? 'standard' : 'isotope');

function recompute(r: CalcRecord, conditions: CalcConditions, warnings: string[], name: string): RrhoResult | null {
  if (!r.atoms || !r.frequencies) return null;
  if (r.multiplicity === null) { warnings.push(`${name}: no multiplicity, so the corrections cannot be recomputed`); return null; }
  if (r.symmetryNumber === null) warnings.push(`${name}: no rotational symmetry number printed; σ = 1 used`);
  const result = rrhoThermo({
    atoms: r.atoms, frequenciesCm1: r.frequencies, symmetryNumber: r.symmetryNumber ?? 1, multiplicity: r.multiplicity,
    temperatureK: conditions.temperatureK, pressurePa: conditions.pressure === '1atm' ? ATM_PA : BAR_PA,
    // Each program's own default masses, so the recomputed values reproduce its printed ones.
    masses: massesOf(r), quasiHarmonic: conditions.quasiHarmonic,
  });
  if (!result.ok) { warnings.push(`${name}: ${result.message}; corrections not recomputed`); return null; }
  warnings.push(...result.value.notes.map((n) => `${name}: ${n}`));
  return result.value;
}

/**
 * Builds one species from a file or a single-point + frequency pair: E from the energy file,
 * thermal corrections recomputed from the frequency file's geometry and frequencies at the
 * given conditions (RRHO, optionally quasi-harmonic), or else the program's printed ones at
 * their own temperature. The structure records both files and how the corrections were made.
 */
export function speciesFromCalc(pair: CalcPair, id: string, conditions: CalcConditions): SpeciesCandidate {
  const { energy, corrections } = pair;
  const e = energy.record;
  const errors: string[] = [];
  const warnings = [...pair.notes, ...fileWarnings(energy), ...(corrections && corrections !== energy ? fileWarnings(corrections) : [])];
  if (e.energyHartree === null) errors.push(`${energy.name}: no electronic energy, so it cannot be a species`);
  const c = corrections?.record ?? null;
  const rrho = c && corrections ? recompute(c, conditions, warnings, corrections.name) : null;
  const separate = corrections !== null && corrections !== energy;
  const structure: Structure = { label: energy.name, electronic: separate ? c!.energyHartree ?? e.energyHartree ?? 0 : e.energyHartree ?? 0 };
  if (separate) structure.singlePoint = e.energyHartree ?? 0;
  let correctionT: number | undefined;
  let how: string | undefined;
  if (rrho) {
    structure.hCorrection = fromJoulesPerMol(rrho.enthalpy, 'hartree');
    structure.gCorrection = fromJoulesPerMol(rrho.gibbs, 'hartree');
    correctionT = conditions.temperatureK;
    how = `recomputed from ${corrections!.name}: ${rrho.method}`;
    structure.rrho = {
      ...rrho.geometry, symmetryNumber: c!.symmetryNumber ?? 1, multiplicity: c!.multiplicity!,
      pressurePa: conditions.pressure === '1atm' ? ATM_PA : BAR_PA, masses: massesOf(c!) === 'isotope' ? 'most abundant isotope' : 'standard atomic weight',
      quasiHarmonic: conditions.quasiHarmonic.method, cutoffCm1: conditions.quasiHarmonic.cutoffCm1,
    };
  } else if (c?.thermo && c.thermo.hCorrection !== null && c.thermo.gCorrection !== null) {
    structure.hCorrection = c.thermo.hCorrection;
    structure.gCorrection = c.thermo.gCorrection;
    correctionT = c.thermo.temperatureK;
    how = `as printed in ${corrections!.name} at ${c.thermo.temperatureK} K and ${c.thermo.pressureAtm} atm (${c.thermo.entropyModel})`;
  } else {
    warnings.push(`${energy.name}: no frequencies, so only E is available`);
  }
  if (c?.frequencies) structure.frequencies = [...c.frequencies];
  structure.source = {
    files: separate ? [sourceFile(energy, 'energy'), sourceFile(corrections!, 'corrections')] : [sourceFile(energy, corrections ? 'energy+corrections' : 'energy')],
    ...(how ? { corrections: how } : {}),
  };
  if (separate && c && (c.formula !== e.formula || c.charge !== e.charge || c.multiplicity !== e.multiplicity)) {
    errors.push(`${energy.name} and ${corrections!.name} are not the same species (formula, charge or multiplicity differ)`);
  }
  const species: Species = {
    id, label: id, phase: 'solute', structures: [structure],
    ...(e.formula ? { formula: e.formula } : {}),
    ...(e.charge !== null ? { charge: e.charge } : {}),
    ...(e.multiplicity !== null ? { multiplicity: e.multiplicity } : {}),
    ...(correctionT !== undefined ? { correctionTemperatureK: correctionT } : {}),
  };
  return { species, energyFile: energy, correctionFile: corrections, rrho, imaginary: c ? imaginaryCount(c) : null, errors, warnings };
}
