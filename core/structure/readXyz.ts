import { ELEMENT_SYMBOLS, isElementSymbol } from '../thermo/elements.ts';

/** One atom of an XYZ geometry, coordinates in ångström. */
export interface XyzAtom {
  element: string;
  x: number;
  y: number;
  z: number;
}

/** Result of {@link readXyz}: the atoms, or a message naming the line. */
export type XyzResult = { ok: true; atoms: XyzAtom[] } | { ok: false; message: string };

/**
 * Reads an XYZ geometry: the usual form (atom count, comment line, then one
 * `symbol x y z` line per atom), or just the atom lines as pasted from a program's output.
 * A symbol may be an atomic number ("6"); columns after z are ignored.
 */
export function readXyz(text: string): XyzResult {
  const lines = text.split(/\r?\n/);
  let start = 0;
  let expected: number | null = null;
  const count = /^\s*(\d+)\s*$/.exec(lines[0] ?? '');
  if (count) {
    expected = Number(count[1]);
    start = 2;
  }
  const atoms: XyzAtom[] = [];
  for (let i = start; i < lines.length; i++) {
    const line = lines[i]!.trim();
    if (line === '') {
      if (expected !== null && atoms.length >= expected) break;
      continue;
    }
    const parts = line.split(/[\s,]+/);
    const element = symbolOf(parts[0]!);
    const [x, y, z] = parts.slice(1, 4).map(Number);
    if (!element) return { ok: false, message: `XYZ line ${i + 1}: "${parts[0]}" is not an element symbol` };
    if (parts.length < 4 || ![x, y, z].every((v) => Number.isFinite(v))) return { ok: false, message: `XYZ line ${i + 1}: expected a symbol and three coordinates, got "${line.slice(0, 40)}"` };
    atoms.push({ element, x: x!, y: y!, z: z! });
    if (expected !== null && atoms.length === expected) break;
  }
  if (atoms.length === 0) return { ok: false, message: 'XYZ: no atoms found' };
  if (expected !== null && atoms.length !== expected) return { ok: false, message: `XYZ: the first line says ${expected} atoms, ${atoms.length} found` };
  return { ok: true, atoms };
}

function symbolOf(word: string): string | null {
  if (/^\d+$/.test(word)) return ELEMENT_SYMBOLS[Number(word) - 1] ?? null;
  const symbol = word.charAt(0).toUpperCase() + word.slice(1).toLowerCase();
  return isElementSymbol(symbol) ? symbol : null;
}
