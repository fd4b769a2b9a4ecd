import type { CalcAtom, CalcRecord } from './calcRecord.ts';
import { elementSymbol } from './elementSymbol.ts';
import { hillFormula } from './hillFormula.ts';
import { textLines } from './textLines.ts';

/** Result of {@link readXyz}: the record, or a message naming the line that is wrong. */
export type XyzResult = { ok: true; record: CalcRecord } | { ok: false; message: string };

/**
 * Reads a plain XYZ file (atom count, comment line, then "symbol x y z" in ångström; several
 * frames in a row are a trajectory and the last counts). A geometry only: energy, charge and
 * frequencies are reported missing — the comment line is not mined for numbers.
 */
export function readXyz(text: string): XyzResult {
  const lines = textLines(text);
  let at = 0;
  let atoms: CalcAtom[] | null = null;
  let frames = 0;
  while (at < lines.length && lines[at]!.trim() !== '') {
    const count = Number(lines[at]!.trim());
    if (!Number.isInteger(count) || count < 1) return { ok: false, message: `line ${at + 1}: expected the number of atoms, got "${lines[at]!.trim()}"` };
    const frame: CalcAtom[] = [];
    for (let j = 0; j < count; j++) {
      const lineNo = at + 2 + j;
      const cells = (lines[lineNo] ?? '').trim().split(/\s+/);
      const symbol = elementSymbol(cells[0] ?? '');
      const [x, y, z] = cells.slice(1, 4).map(Number);
      if (lineNo >= lines.length || !symbol || ![x, y, z].every(Number.isFinite)) {
        return { ok: false, message: `line ${lineNo + 1}: expected "symbol x y z" for atom ${j + 1} of ${count}, got "${(lines[lineNo] ?? '').trim()}"` };
      }
      frame.push({ symbol, x: x!, y: y!, z: z! });
    }
    atoms = frame;
    frames++;
    at += count + 2;
  }
  if (!atoms) return { ok: false, message: 'line 1: expected the number of atoms' };
  return {
    ok: true,
    record: {
      program: 'xyz', version: null, method: null, energyHartree: null, energyLabel: null, charge: null, multiplicity: null,
      atoms, formula: hillFormula(atoms), frequencies: null, thermo: null, symmetryNumber: null,
      termination: 'normal', optimisation: 'none',
      missing: ['electronic energy', 'charge and multiplicity', 'harmonic frequencies', 'thermochemistry'],
      notes: frames > 1 ? [`${frames} frames; the last is used`] : [],
    },
  };
}
