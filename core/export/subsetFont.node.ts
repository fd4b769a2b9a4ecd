import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { setFlagsFromString } from 'node:v8';
import type { FontSubsetter } from './sceneToPdf.ts';

/** The C entry points of HarfBuzz's hb-subset (hb-subset.h) that harfbuzz-subset.wasm exports. */
interface HbSubset {
  memory: WebAssembly.Memory;
  malloc(size: number): number;
  free(ptr: number): void;
  hb_blob_create(data: number, length: number, mode: number, userData: number, destroy: number): number;
  hb_blob_destroy(blob: number): void;
  hb_blob_get_data(blob: number, lengthOut: number): number;
  hb_blob_get_length(blob: number): number;
  hb_face_create(blob: number, index: number): number;
  hb_face_destroy(face: number): void;
  hb_face_reference_blob(face: number): number;
  hb_set_add(set: number, codepoint: number): void;
  hb_subset_input_create_or_fail(): number;
  hb_subset_input_destroy(input: number): void;
  hb_subset_input_unicode_set(input: number): number;
  hb_subset_input_set_flags(input: number, flags: number): void;
  hb_subset_input_set(input: number, setType: number): number;
  hb_subset_or_fail(face: number, input: number): number;
  _initialize(): void;
}

// hb-blob.h and hb-subset.h constants.
const HB_MEMORY_MODE_READONLY = 1;
const HB_SUBSET_FLAGS_NO_HINTING = 0x1;
const HB_SUBSET_SETS_DROP_TABLE_TAG = 3;

/** An OpenType table tag as HarfBuzz's 32-bit number (big-endian ASCII, hb_tag_t). */
const tag = (name: string) => [...name].reduce((n, ch) => n * 256 + ch.charCodeAt(0), 0);
// OpenType layout tables: only a shaping engine reads them, and jsPDF places glyphs one by one
// from the cmap. Dropping them also spares the GSUB closure, most of the subsetting time.
const LAYOUT_TABLES = ['GSUB', 'GPOS', 'GDEF'].map(tag);

let instance: Promise<HbSubset> | undefined;

/** Instantiates harfbuzz-subset.wasm (shipped by harfbuzzjs) once per process; it imports nothing. */
function hbSubset(): Promise<HbSubset> {
  instance ??= (async () => {
    // Baseline code only: otherwise V8 also recompiles the whole 0.7 MB module with its
    // optimising compiler on background threads, 0.5–0.8 s of CPU (measured on Node 20 with
    // tests/bench/cliBench.mjs) for a subset that takes milliseconds either way.
    setFlagsFromString('--liftoff-only');
    const path = createRequire(import.meta.url).resolve('harfbuzzjs/dist/harfbuzz-subset.wasm');
    const { instance: wasm } = await WebAssembly.instantiate(await readFile(path));
    const hb = wasm.exports as unknown as HbSubset;
    hb._initialize();
    return hb;
  })();
  return instance;
}

/**
 * Subsets a TrueType font to the code points of `text` with HarfBuzz's hb-subset, keeping
 * TrueType outlines, the cmap and the name table (which jsPDF reads); hinting and the
 * OpenType layout tables are dropped, since PDF viewers scale outlines themselves and jsPDF
 * does no shaping. Node only (the wasm is read with node:fs).
 * Throws if HarfBuzz cannot parse or subset the font.
 */
export const subsetFontNode: FontSubsetter = async (font, text) => {
  const hb = await hbSubset();
  const fontPtr = hb.malloc(font.length);
  new Uint8Array(hb.memory.buffer).set(font, fontPtr);
  const blob = hb.hb_blob_create(fontPtr, font.length, HB_MEMORY_MODE_READONLY, 0, 0);
  const face = hb.hb_face_create(blob, 0);
  const input = hb.hb_subset_input_create_or_fail();
  try {
    if (!input) throw new Error('subsetFont: HarfBuzz could not allocate a subset input');
    const unicodes = hb.hb_subset_input_unicode_set(input);
    for (const ch of text) hb.hb_set_add(unicodes, ch.codePointAt(0)!);
    hb.hb_subset_input_set_flags(input, HB_SUBSET_FLAGS_NO_HINTING);
    const dropped = hb.hb_subset_input_set(input, HB_SUBSET_SETS_DROP_TABLE_TAG);
    for (const t of LAYOUT_TABLES) hb.hb_set_add(dropped, t);
    const subset = hb.hb_subset_or_fail(face, input);
    if (!subset) throw new Error('subsetFont: HarfBuzz could not subset the font');
    const out = hb.hb_face_reference_blob(subset);
    // Copy out before freeing: the wasm heap may be reused (and grown) by the next call.
    const bytes = new Uint8Array(hb.memory.buffer, hb.hb_blob_get_data(out, 0), hb.hb_blob_get_length(out)).slice();
    hb.hb_blob_destroy(out);
    hb.hb_face_destroy(subset);
    if (bytes.length === 0) throw new Error('subsetFont: HarfBuzz returned an empty font');
    return bytes;
  } finally {
    if (input) hb.hb_subset_input_destroy(input);
    hb.hb_face_destroy(face);
    hb.hb_blob_destroy(blob);
    hb.free(fontPtr);
  }
};
