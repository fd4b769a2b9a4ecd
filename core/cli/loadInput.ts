import { extname } from 'node:path';
import { formatErrors, parseDocument } from '../model/load.ts';
import type { Document } from '../model/schema.ts';
import { importTable } from '../import/table.ts';
import { CliError, type CliIo } from './io.ts';
import { readText } from './readText.ts';

/** Reads a `.passline` document or a CSV/TSV table of points into a document. */
export function loadInput(path: string, io: CliIo): Document {
  const text = readText(path, io);
  const ext = extname(path).toLowerCase();
  const looksJson = ext === '.passline' || ext === '.json' || /^\uFEFF?\s*\{/.test(text);
  if (looksJson) {
    const result = parseDocument(text);
    if (!result.ok) throw new CliError(`${path}: ${formatErrors(result.errors).split('\n').join('; ')}`);
    return result.doc;
  }
  const result = importTable(text, path);
  if (!result.ok) {
    throw new CliError(`${path}: ${result.errors.map((e) => `line ${e.row}, column "${e.column}"${e.value ? ` (${JSON.stringify(e.value)})` : ''}: ${e.message}`).join('; ')}`);
  }
  return result.doc;
}
