import { requireTable, type TableSpan } from './readTables.ts';

/**
 * Code point -> glyph id from the font's `cmap` table. Prefers a full-Unicode format 12
 * subtable (platform 3 encoding 10, or platform 0), else a BMP format 4 subtable
 * (ISO 14496-22 §5.2.1, "cmap" formats 4 and 12).
 */
export function readCmap(bytes: Uint8Array, tables: Map<string, TableSpan>): Map<number, number> {
  const { offset } = requireTable(tables, 'cmap');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint16(offset + 2);
  let best: { at: number; format: number } | undefined;
  for (let i = 0; i < count; i++) {
    const rec = offset + 4 + i * 8;
    const platform = view.getUint16(rec);
    const encoding = view.getUint16(rec + 2);
    const at = offset + view.getUint32(rec + 4);
    const format = view.getUint16(at);
    const unicode = platform === 0 || (platform === 3 && (encoding === 1 || encoding === 10));
    if (!unicode || (format !== 4 && format !== 12)) continue;
    if (!best || (format === 12 && best.format === 4)) best = { at, format };
  }
  if (!best) throw new Error('font: no Unicode cmap subtable of format 4 or 12');
  return best.format === 12 ? readFormat12(view, best.at) : readFormat4(view, best.at);
}

function readFormat12(view: DataView, at: number): Map<number, number> {
  const map = new Map<number, number>();
  const groups = view.getUint32(at + 12);
  for (let g = 0; g < groups; g++) {
    const rec = at + 16 + g * 12;
    const start = view.getUint32(rec);
    const end = view.getUint32(rec + 4);
    const glyph = view.getUint32(rec + 8);
    for (let c = start; c <= end; c++) map.set(c, glyph + (c - start));
  }
  return map;
}

function readFormat4(view: DataView, at: number): Map<number, number> {
  const map = new Map<number, number>();
  const segs = view.getUint16(at + 6) / 2;
  const ends = at + 14;
  const starts = ends + segs * 2 + 2;
  const deltas = starts + segs * 2;
  const rangeOffsets = deltas + segs * 2;
  for (let s = 0; s < segs; s++) {
    const start = view.getUint16(starts + s * 2);
    const end = view.getUint16(ends + s * 2);
    const delta = view.getInt16(deltas + s * 2);
    const rangeAt = rangeOffsets + s * 2;
    const range = view.getUint16(rangeAt);
    for (let c = start; c <= end && c !== 0xffff; c++) {
      let glyph: number;
      if (range === 0) glyph = (c + delta) & 0xffff;
      else {
        // idRangeOffset counts bytes from its own position into glyphIdArray.
        const raw = view.getUint16(rangeAt + range + (c - start) * 2);
        glyph = raw === 0 ? 0 : (raw + delta) & 0xffff;
      }
      if (glyph !== 0) map.set(c, glyph);
    }
  }
  return map;
}
