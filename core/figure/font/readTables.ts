/** Offset and length of one table inside a TrueType/OpenType file. */
export interface TableSpan {
  offset: number;
  length: number;
}

/**
 * Reads the table directory of an sfnt font (TrueType or OpenType, Apple TrueType
 * Reference Manual / ISO 14496-22 §5.1). Throws on bytes that are not a font: callers
 * pass a bundled font file, so a bad one is a programmer error.
 */
export function readTables(bytes: Uint8Array): Map<string, TableSpan> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (bytes.byteLength < 12) throw new Error('font: file too short for an sfnt header');
  const version = view.getUint32(0);
  if (version !== 0x00010000 && version !== 0x4f54544f && version !== 0x74727565) {
    throw new Error(`font: not a TrueType/OpenType file (version 0x${version.toString(16)})`);
  }
  const count = view.getUint16(4);
  const tables = new Map<string, TableSpan>();
  for (let i = 0; i < count; i++) {
    const at = 12 + i * 16;
    const tag = String.fromCharCode(bytes[at]!, bytes[at + 1]!, bytes[at + 2]!, bytes[at + 3]!);
    const span = { offset: view.getUint32(at + 8), length: view.getUint32(at + 12) };
    if (span.offset + span.length > bytes.byteLength) throw new Error(`font: table ${tag} runs past the end of the file`);
    tables.set(tag, span);
  }
  return tables;
}

/** The span of a required table; throws when the font lacks it. */
export function requireTable(tables: Map<string, TableSpan>, tag: string): TableSpan {
  const span = tables.get(tag);
  if (!span) throw new Error(`font: missing required table "${tag}"`);
  return span;
}
