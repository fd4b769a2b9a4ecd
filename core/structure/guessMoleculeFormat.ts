import type { Molecule } from '../model/schema.ts';

/**
 * Which kind of structure text this is, as pasted or dropped: a molfile (has a V2000/V3000
 * counts line or `M  END`), an XYZ geometry (an atom count line, or lines of a symbol and
 * three numbers), else SMILES. A file name's extension (.mol, .sdf, .xyz, .smi) wins.
 */
export function guessMoleculeFormat(text: string, fileName?: string): Molecule['format'] {
  const ext = fileName?.toLowerCase().match(/\.(\w+)$/)?.[1];
  if (ext === 'mol' || ext === 'sdf' || ext === 'mdl') return 'molfile';
  if (ext === 'xyz') return 'xyz';
  if (ext === 'smi' || ext === 'smiles') return 'smiles';
  if (/V[23]000|^M {2}END/m.test(text)) return 'molfile';
  const lines = text.trim().split(/\r?\n/);
  const atomLine = /^\s*([A-Za-z]{1,3}|\d{1,3})\s+-?\d+(\.\d*)?([eE][-+]?\d+)?\s+-?\d+(\.\d*)?([eE][-+]?\d+)?\s+-?\d+(\.\d*)?([eE][-+]?\d+)?\s*$/;
  if (/^\s*\d+\s*$/.test(lines[0] ?? '') && lines.length >= 3) return 'xyz';
  if (lines.some((l) => atomLine.test(l))) return 'xyz';
  return 'smiles';
}
