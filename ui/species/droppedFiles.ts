/** A file's name (with its folder, when it came from one) and its text. */
export interface NamedText { name: string; text: string }

/** Files inside a dropped folder that may be outputs; other files there are skipped. */
const OUTPUT_NAME = /\.(log|out|xyz)$/i;
/** Bigger files are refused rather than read into memory (output logs of a few MB are usual). */
export const MAX_OUTPUT_BYTES = 200 * 1024 * 1024;

interface Entry { isFile: boolean; isDirectory: boolean; name: string; fullPath: string; file?(ok: (f: File) => void, fail: (e: unknown) => void): void; createReader?(): { readEntries(ok: (e: Entry[]) => void, fail: (e: unknown) => void): void } }

async function walk(entry: Entry, out: File[], names: string[]): Promise<void> {
  if (entry.isFile && entry.file) {
    if (!OUTPUT_NAME.test(entry.name) && entry.fullPath.split('/').length > 2) return;
    out.push(await new Promise<File>((ok, fail) => entry.file!(ok, fail)));
    names.push(entry.fullPath.replace(/^\//, ''));
    return;
  }
  if (!entry.isDirectory || !entry.createReader) return;
  const reader = entry.createReader();
  for (;;) {
    const batch = await new Promise<Entry[]>((ok, fail) => reader.readEntries(ok, fail));
    if (batch.length === 0) return;
    for (const child of batch) await walk(child, out, names);
  }
}

/**
 * Reads the files of a drop or a file picker as text: dropped folders are walked (only
 * .log, .out and .xyz files inside them), files dropped directly are all read. Files too
 * big to read are named in `refused`.
 */
export async function readDroppedFiles(source: DataTransfer | FileList): Promise<{ files: NamedText[]; refused: string[] }> {
  const files: File[] = [];
  const names: string[] = [];
  const items = 'items' in source && source.items ? [...source.items] : [];
  const entries = items.map((i) => (i as DataTransferItem & { webkitGetAsEntry?: () => Entry | null }).webkitGetAsEntry?.() ?? null);
  if (entries.length > 0 && entries.every((e) => e !== null)) {
    for (const e of entries) await walk(e!, files, names);
  } else {
    for (const f of 'files' in source ? [...source.files] : [...source]) { files.push(f); names.push(f.webkitRelativePath || f.name); }
  }
  const refused: string[] = [];
  const read: NamedText[] = [];
  for (const [i, f] of files.entries()) {
    if (f.size > MAX_OUTPUT_BYTES) { refused.push(`${names[i]}: ${(f.size / 1024 ** 2).toFixed(0)} MB is too big to read here (the limit is ${MAX_OUTPUT_BYTES / 1024 ** 2} MB); use passline species on the command line`); continue; }
    read.push({ name: names[i]!, text: await f.text() });
  }
  return { files: read, refused };
}
