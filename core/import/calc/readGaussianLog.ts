import type { CalcAtom, CalcRecord, Optimisation, ProgramThermo, Termination } from './calcRecord.ts';
import { elementSymbol } from './elementSymbol.ts';
import { hillFormula } from './hillFormula.ts';
import { fortranNumber, textLines } from './textLines.ts';

const STEP_START = /Entering Gaussian System|Proceeding to internal job step number/;
const JOB_WORDS = /^(#[npt]?|opt|freq|sp|irc|scan|guess|geom|pop|iop|nosymm|symmetry|scf|maxdisk|test|output|formcheck|stable|nmr|polar|volume|density|td|units)\b/i;

/** The level of theory in a route: the method/basis token and the options that change the energy. */
function levelOf(route: string): string | null {
  const tokens = route.split(/\s+/).filter(Boolean);
  const level = tokens.filter((t) => t.includes('/') || /^(empiricaldispersion|scrf|int|integral)\b/i.test(t));
  if (level.length > 0) return level.join(' ');
  const rest = tokens.filter((t) => !JOB_WORDS.test(t));
  return rest.length > 0 ? rest.join(' ') : null;
}

/** An orientation block after its title line: rows of center, Z, type, x, y, z between dashed lines; null when cut off. */
function readOrientation(lines: string[], title: number): { atoms: CalcAtom[]; end: number } | null {
  const atoms: CalcAtom[] = [];
  let i = title + 5;
  for (; i < lines.length; i++) {
    const line = lines[i]!;
    if (/^\s*-{10,}/.test(line)) return atoms.length > 0 ? { atoms, end: i } : null;
    const cells = line.trim().split(/\s+/);
    const symbol = elementSymbol(cells[1] ?? '');
    const [x, y, z] = cells.slice(-3).map(Number);
    if (cells.length < 5 || !symbol || ![x, y, z].every(Number.isFinite)) return null;
    atoms.push({ symbol, x: x!, y: y!, z: z! });
  }
  return null;
}

/**
 * Reads a Gaussian log (Gaussian 09/16): the last job step's result counts. Final energy
 * (SCF, or MP2 / CCSD(T) when printed after it) and its method line, charge and multiplicity, the last standard (else input)
 * orientation, harmonic frequencies, the printed thermochemistry, the rotational symmetry
 * number, termination and whether an optimisation converged. Pure: text in, record out.
 */
export function readGaussianLog(text: string): CalcRecord {
  const lines = textLines(text);
  let version: string | null = null;
  let route: string | null = null;
  let optRequested = false;
  let energy: { value: number; label: string } | null = null;
  let charge: number | null = null;
  let multiplicity: number | null = null;
  let standard: CalcAtom[] | null = null;
  let input: CalcAtom[] | null = null;
  let frequencies: number[] | null = null;
  let frequencyBlocks = 0;
  // A header opens a block; it counts once its first "Frequencies --" row is read, since freq=hpmodes and
  // IOp(7/33=1) print a high-precision table ("Frequencies ---") of the same modes under its own header first.
  let blockOpen = false;
  let thermoT: { t: number; p: number } | null = null;
  let thermoRoute: string | null = null;
  const corrections: Record<'zpe' | 'e' | 'h' | 'g', number | null> = { zpe: null, e: null, h: null, g: null };
  let symmetryNumber: number | null = null;
  let lastTermination: 'normal' | 'error' | null = null;
  let stepAfterTermination = false;
  let optimisation: Optimisation = 'none';
  let cutOrientation = false;
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    let m: RegExpExecArray | null;
    if (STEP_START.test(line)) { stepAfterTermination = true; continue; }
    if ((m = /Gaussian (\d+):\s+\S+?-G\d+Rev([A-Z]\.\d+)/.exec(line))) { version = `Gaussian ${m[1]} ${m[2]}`; continue; }
    if (/^ #/.test(line) && /^\s*-{5,}\s*$/.test(lines[i - 1] ?? '')) {
      let r = line.trim();
      while (i + 1 < lines.length && !/^\s*-{5,}\s*$/.test(lines[i + 1]!)) r += lines[++i]!.replace(/^ /, '');
      route = r;
      if (/(^|\s)opt\b/i.test(r)) optRequested = true;
      continue;
    }
    if ((m = /SCF Done:\s+(E\([^)]+\))\s*=\s*(\S+)/.exec(line))) {
      const value = fortranNumber(m[2]);
      if (value !== null) energy = { value, label: m[1]! };
      continue;
    }
    // Correlated energies follow the SCF of the same step; the last one printed is the method's result.
    if ((m = /EUMP2 =\s*(\S+)/.exec(line)) || (m = /^\s*CCSD\(T\)=\s*(\S+)/.exec(line))) {
      const value = fortranNumber(m[1]);
      if (value !== null) energy = { value, label: line.includes('EUMP2') ? 'MP2' : 'CCSD(T)' };
      continue;
    }
    if ((m = /Charge =\s*(-?\d+) Multiplicity =\s*(\d+)/.exec(line))) { charge = Number(m[1]); multiplicity = Number(m[2]); continue; }
    if (/^\s+(Standard|Input) orientation:/.test(line)) {
      const block = readOrientation(lines, i);
      if (!block) { cutOrientation = true; continue; }
      if (line.includes('Standard')) standard = block.atoms; else input = block.atoms;
      cutOrientation = false;
      i = block.end;
      continue;
    }
    if (/Harmonic frequencies \(cm\*\*-1\)/.test(line)) { frequencies = []; blockOpen = true; continue; }
    if ((m = /^\s*Frequencies --\s+(.*)$/.exec(line)) && frequencies) {
      if (blockOpen) { frequencyBlocks++; blockOpen = false; }
      for (const cell of m[1]!.trim().split(/\s+/)) {
        const f = fortranNumber(cell);
        if (f !== null) frequencies.push(f);
      }
      continue;
    }
    if ((m = /Temperature\s+(\S+) Kelvin\.\s+Pressure\s+(\S+) Atm\./.exec(line))) { thermoT = { t: Number(m[1]), p: Number(m[2]) }; thermoRoute = route; continue; }
    if ((m = /Rotational symmetry number\s+(\d+)/.exec(line))) { symmetryNumber = Number(m[1]); continue; }
    if ((m = /Zero-point correction=\s+(\S+)/.exec(line))) { corrections.zpe = fortranNumber(m[1]); continue; }
    if ((m = /Thermal correction to (Energy|Enthalpy|Gibbs Free Energy)=\s+(\S+)/.exec(line))) {
      corrections[m[1] === 'Energy' ? 'e' : m[1] === 'Enthalpy' ? 'h' : 'g'] = fortranNumber(m[2]);
      continue;
    }
    if (/Item\s+Value\s+Threshold\s+Converged\?/.test(line)) {
      const table = lines.slice(i + 1, i + 5);
      if (table.some((row) => /\sNO\s*$/.test(row))) optimisation = 'not-converged';
      continue;
    }
    if (/Optimization completed\.|-- Stationary point found\./.test(line)) { optimisation = 'converged'; continue; }
    if (/Optimization stopped\./.test(line)) { optimisation = 'not-converged'; continue; }
    if (/Normal termination of Gaussian/.test(line)) { lastTermination = 'normal'; stepAfterTermination = false; continue; }
    if (/Error termination/.test(line)) { lastTermination = 'error'; stepAfterTermination = false; continue; }
  }
  const atoms = standard ?? input;
  const missing: string[] = [];
  const notes: string[] = [];
  const termination: Termination = lastTermination === 'error' ? 'abnormal' : lastTermination === 'normal' && !stepAfterTermination ? 'normal' : 'truncated';
  if (optRequested && optimisation === 'none') optimisation = 'not-converged';
  if (!optRequested && optimisation === 'not-converged') {
    notes.push('no optimisation in this job, and its own convergence check finds the geometry is not a stationary point at this level (a "NO" in the force and displacement table)');
  }
  if (!energy) missing.push('final electronic energy (no "SCF Done" line)');
  if (charge === null) missing.push('charge and multiplicity');
  if (!atoms) missing.push('geometry');
  if (cutOrientation) notes.push('the last orientation block is cut off; the one before it is used');
  if (frequencies === null || frequencies.length === 0) { frequencies = null; missing.push('harmonic frequencies'); }
  if (frequencyBlocks > 1) notes.push(`${frequencyBlocks} frequency blocks; the last is used`);
  let thermo: ProgramThermo | null = null;
  if (thermoT && corrections.g !== null) {
    thermo = { temperatureK: thermoT.t, pressureAtm: thermoT.p, zpe: corrections.zpe, eCorrection: corrections.e, hCorrection: corrections.h, gCorrection: corrections.g, entropyModel: 'harmonic' };
  } else missing.push('thermochemistry');
  if (thermo && route && thermoRoute && levelOf(thermoRoute) !== levelOf(route)) {
    notes.push(`the thermochemistry is from an earlier job step (${levelOf(thermoRoute)}), the energy from the last (${levelOf(route)})`);
  }
  if (termination === 'truncated') missing.push('a termination line (the file ends early)');
  return {
    program: 'gaussian', version, method: route ? levelOf(route) : null,
    energyHartree: energy?.value ?? null, energyLabel: energy?.label ?? null,
    charge, multiplicity, atoms, formula: atoms ? hillFormula(atoms) : null,
    frequencies, thermo, symmetryNumber, termination, optimisation, missing, notes,
  };
}
