import { readCmap } from './readCmap.ts';
import { readTables, requireTable } from './readTables.ts';

/** The horizontal metrics Passline needs to lay text out, read from one font file. */
export interface FontMetrics {
  /** Family name used in SVG `font-family` and as the PDF font name. */
  family: string;
  unitsPerEm: number;
  /** Ascender and descender as fractions of the em (descender positive, below the baseline). */
  ascent: number;
  descent: number;
  /** Advance width of a code point in em; the font's .notdef advance when it has no glyph. */
  advance(codePoint: number): number;
  /** True when the font maps the code point to a real glyph. */
  has(codePoint: number): boolean;
}

/**
 * Reads unitsPerEm (`head`), ascender/descender (`hhea`), advances (`hmtx`) and the
 * character map (`cmap`) of a TrueType font (ISO 14496-22 §5.2). Pure: the caller loads
 * the bytes (node:fs in the CLI, fetch in the renderer).
 */
export function readFontMetrics(bytes: Uint8Array, family = 'DejaVu Sans'): FontMetrics {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const tables = readTables(bytes);
  const head = requireTable(tables, 'head').offset;
  const hhea = requireTable(tables, 'hhea').offset;
  const hmtx = requireTable(tables, 'hmtx').offset;
  const unitsPerEm = view.getUint16(head + 18);
  if (unitsPerEm < 16) throw new Error(`font: implausible unitsPerEm ${unitsPerEm}`);
  const ascent = view.getInt16(hhea + 4) / unitsPerEm;
  const descent = -view.getInt16(hhea + 6) / unitsPerEm;
  const longMetrics = view.getUint16(hhea + 34);
  const advances = new Float64Array(longMetrics);
  for (let g = 0; g < longMetrics; g++) advances[g] = view.getUint16(hmtx + g * 4) / unitsPerEm;
  const cmap = readCmap(bytes, tables);
  // Glyphs past numberOfHMetrics share the last advance (hmtx spec).
  const advanceOf = (glyph: number) => advances[Math.min(glyph, longMetrics - 1)] ?? 0;
  return {
    family,
    unitsPerEm,
    ascent,
    descent,
    advance: (codePoint) => advanceOf(cmap.get(codePoint) ?? 0),
    has: (codePoint) => cmap.has(codePoint),
  };
}
