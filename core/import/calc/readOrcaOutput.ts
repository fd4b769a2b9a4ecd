import type { CalcAtom, CalcRecord, Optimisation, ProgramThermo, Termination } from './calcRecord.ts';
import { elementSymbol } from './elementSymbol.ts';
import { hillFormula } from './hillFormula.ts';
import { fortranNumber, textLines } from './textLines.ts';

// Keywords that choose the job, the output or the convergence, not the level of theory.
const JOB_KEYWORDS = /^(opt|copt|zopt|gdiis-opt|optts|scants|irc|neb(-ts)?|freq|numfreq|anfreq|sp|energy|engrad|md|(very|extreme|normal|loose|sloppy|strong|tight)(scf|opt)|usesym|nousesym|(mini|small|normal|large)print|printbasis|printmos|pal\d+|slowconv|veryslowconv|kdiis|soscf|nososcf|moread|noautostart|xyzfile|pdbfile|keepdens|allpop|nopop|uno)$/i;

/** The level of theory in ORCA's simple-input keywords ("b3lyp sto-3g freq" → "b3lyp sto-3g"). */
function levelOf(keywords: string): string | null {
  const level = keywords.split(/\s+/).filter((k) => k && !JOB_KEYWORDS.test(k));
  return level.length > 0 ? level.join(' ') : null;
}

function readCoordinates(lines: string[], title: number): CalcAtom[] | null {
  const atoms: CalcAtom[] = [];
  for (let i = title + 2; i < lines.length; i++) {
    const cells = lines[i]!.trim().split(/\s+/);
    if (lines[i]!.trim() === '') return atoms.length > 0 ? atoms : null;
    const symbol = elementSymbol(cells[0] ?? '');
    const [x, y, z] = cells.slice(1, 4).map(Number);
    if (cells.length !== 4 || !symbol || ![x, y, z].every(Number.isFinite)) return null;
    atoms.push({ symbol, x: x!, y: y!, z: z! });
  }
  return null;
}

const hartrees = (line: string) => fortranNumber(/(-?\d+\.\d+)\s+Eh/.exec(line)?.[1]);

/**
 * Reads an ORCA output (ORCA 4–6): the last printed result counts. Final single-point energy
 * and the keyword line, charge and multiplicity, the last Cartesian coordinates, the
 * vibrational frequencies (the six or five zero modes dropped), the printed thermochemistry
 * with its entropy model, the symmetry number, termination and optimisation convergence.
 */
export function readOrcaOutput(text: string): CalcRecord {
  const lines = textLines(text);
  let version: string | null = null;
  const keywords: string[] = [];
  let inputCharge: { charge: number; multiplicity: number } | null = null;
  let charge: number | null = null;
  let multiplicity: number | null = null;
  let energy: number | null = null;
  let atoms: CalcAtom[] | null = null;
  let frequencies: number[] | null = null;
  let frequencyBlocks = 0;
  let t: number | null = null;
  let p: number | null = null;
  let zpe: number | null = null;
  let uCorrection: number | null = null;
  let kT: number | null = null;
  let gCorrection: number | null = null;
  let entropyModel = 'harmonic';
  let symmetryNumber: number | null = null;
  let termination: Termination = 'truncated';
  let optimisation: Optimisation = 'none';
  let cutGeometry = false;
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    let m: RegExpExecArray | null;
    if ((m = /Program Version (\S+)/.exec(line))) { version = `ORCA ${m[1]}`; continue; }
    if ((m = /^\|\s*\d+>\s*!(.*)$/.exec(line))) { keywords.push(m[1]!.trim()); continue; }
    if ((m = /^\|\s*\d+>\s*\*\s*xyz(?:file)?\s+(-?\d+)\s+(\d+)/i.exec(line))) { inputCharge = { charge: Number(m[1]), multiplicity: Number(m[2]) }; continue; }
    if ((m = /Total Charge\s+Charge\s+\.+\s+(-?\d+)/.exec(line))) { charge = Number(m[1]); continue; }
    if ((m = /Multiplicity\s+Mult\s+\.+\s+(\d+)/.exec(line))) { multiplicity = Number(m[1]); continue; }
    if ((m = /^FINAL SINGLE POINT ENERGY\s+(\S+)/.exec(line))) { energy = fortranNumber(m[1]) ?? energy; continue; }
    if (/^CARTESIAN COORDINATES \(ANGSTROEM\)/.test(line)) {
      const block = readCoordinates(lines, i);
      if (block) { atoms = block; cutGeometry = false; } else cutGeometry = true;
      continue;
    }
    if (/^VIBRATIONAL FREQUENCIES/.test(line)) { frequencies = []; frequencyBlocks++; continue; }
    if ((m = /^\s*(\d+):\s+(-?\d+\.\d+) cm\*\*-1/.exec(line)) && frequencies) {
      const f = Number(m[2]);
      // The zero modes of translation and rotation lead the list; ORCA prints them as 0.00.
      if (!(f === 0 && frequencies.length === 0 && Number(m[1]) < 6)) frequencies.push(f);
      continue;
    }
    if ((m = /^Temperature\s+\.\.\.\s+(\S+) K/.exec(line))) { t = Number(m[1]); continue; }
    if ((m = /^Pressure\s+\.\.\.\s+(\S+) atm/.exec(line))) { p = Number(m[1]); continue; }
    if (/^Zero point energy\s+\.\.\./.test(line)) { zpe = hartrees(line); continue; }
    if (/^Total correction\s/.test(line)) { uCorrection = hartrees(line); continue; }
    if (/^Thermal Enthalpy correction\s/.test(line)) { kT = hartrees(line); continue; }
    if (/^G-E\(el\)\s/.test(line)) { gCorrection = hartrees(line); continue; }
    if ((m = /QRRHO of S\. Grimme/.exec(line))) {
      const ref = /reference frequency of\s+(\S+) cm-1/.exec(`${line} ${lines[i + 1] ?? ''}`);
      entropyModel = `Grimme quasi-RRHO entropy${ref ? `, ${Number(ref[1])} cm⁻¹` : ''}`;
      continue;
    }
    if ((m = /Symmetry Number:\s+(\d+)/.exec(line))) { symmetryNumber = Number(m[1]); continue; }
    if (/THE OPTIMIZATION HAS CONVERGED/.test(line)) { optimisation = 'converged'; continue; }
    if (/The optimization did not converge/.test(line)) { optimisation = 'not-converged'; continue; }
    if (/\*\*\*\*ORCA TERMINATED NORMALLY\*\*\*\*/.test(line)) { termination = 'normal'; continue; }
    if (/ORCA finished by error termination|aborting the run/.test(line)) { termination = 'abnormal'; continue; }
  }
  const keywordLine = keywords.join(' ');
  if (/(^|\s)(opt|copt|zopt|optts)(\s|$)/i.test(keywordLine) && optimisation === 'none') optimisation = 'not-converged';
  charge ??= inputCharge?.charge ?? null;
  multiplicity ??= inputCharge?.multiplicity ?? null;
  const missing: string[] = [];
  const notes: string[] = [];
  if (energy === null) missing.push('final electronic energy (no "FINAL SINGLE POINT ENERGY" line)');
  if (charge === null || multiplicity === null) missing.push('charge and multiplicity');
  if (!atoms) missing.push('geometry');
  if (cutGeometry) notes.push('the last coordinate block is cut off; the one before it is used');
  if (frequencies === null || frequencies.length === 0) { frequencies = null; missing.push('harmonic frequencies'); }
  if (frequencyBlocks > 1) notes.push(`${frequencyBlocks} frequency blocks; the last is used`);
  let thermo: ProgramThermo | null = null;
  if (t !== null && gCorrection !== null) {
    thermo = {
      temperatureK: t, pressureAtm: p ?? 1, zpe, eCorrection: uCorrection,
      hCorrection: uCorrection !== null && kT !== null ? uCorrection + kT : null, gCorrection, entropyModel,
    };
  } else missing.push('thermochemistry');
  if (termination === 'truncated') missing.push('the normal-termination line (the file ends early)');
  return {
    program: 'orca', version, method: keywordLine ? levelOf(keywordLine) : null,
    energyHartree: energy, energyLabel: energy === null ? null : 'FINAL SINGLE POINT ENERGY',
    charge, multiplicity, atoms, formula: atoms ? hillFormula(atoms) : null,
    frequencies, thermo, symmetryNumber, termination, optimisation, missing, notes,
  };
}
