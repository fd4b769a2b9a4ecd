import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A font a PDF lists, and whether its program is in the file. */
export interface ListedFont {
  name: string;
  embedded: boolean;
}

/**
 * Every font dictionary of a PDF and whether its font program is embedded, read from the
 * file's objects as ISO 32000-1 §9.6–9.9 lays them out: a simple font's /FontDescriptor,
 * or a Type0 font's descendant's, must point at /FontFile, /FontFile2 or /FontFile3.
 * Handles the uncompressed object dictionaries jsPDF writes (its streams are compressed,
 * its dictionaries are not).
 */
export function listPdfFonts(bytes: Uint8Array): ListedFont[] {
  const text = new TextDecoder('latin1').decode(bytes);
  const objects = new Map<string, string>();
  for (const m of text.matchAll(/(\d+) 0 obj([\s\S]*?)(?:stream|endobj)/g)) objects.set(m[1]!, m[2]!);
  const ref = (dict: string, key: string) => new RegExp(`/${key}\\s*\\[?\\s*(\\d+) 0 R`).exec(dict)?.[1];
  const hasProgram = (font: string): boolean => {
    const descendant = ref(font, 'DescendantFonts');
    if (descendant) return hasProgram(objects.get(descendant) ?? '');
    const descriptor = ref(font, 'FontDescriptor');
    return descriptor !== undefined && /\/FontFile[23]?\s+\d+ 0 R/.test(objects.get(descriptor) ?? '');
  };
  const fonts: ListedFont[] = [];
  for (const dict of objects.values()) {
    // Top-level fonts only: a Type0's CIDFont descendant is judged through its parent.
    if (!/\/Type\s*\/Font\b/.test(dict) || /\/Subtype\s*\/CIDFontType/.test(dict)) continue;
    const name = /\/BaseFont\s*\/([^\s/<>[\]]+)/.exec(dict)?.[1] ?? '?';
    fonts.push({ name, embedded: hasProgram(dict) });
  }
  return fonts;
}

/**
 * The same question asked of poppler's pdffonts (Debian poppler-utils), an independent
 * reader: the `emb` column of each listed font. Null when pdffonts is not installed.
 */
export function pdffontsEmbedded(bytes: Uint8Array): boolean[] | null {
  if (spawnSync('pdffonts', ['-v'], { encoding: 'utf8' }).error) return null;
  const file = join(mkdtempSync(join(tmpdir(), 'passline-pdffonts-')), 'f.pdf');
  writeFileSync(file, bytes);
  const lines = execFileSync('pdffonts', [file], { encoding: 'utf8' }).trim().split('\n').slice(2);
  // Columns from the right: object ID (two fields), uni, sub, emb.
  return lines.map((l) => l.trim().split(/\s+/).at(-5) === 'yes');
}
