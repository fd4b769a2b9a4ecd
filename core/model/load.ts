import type { z } from 'zod';
import { Document, describe, FORMAT_VERSION, type DocumentInput } from './schema.ts';
import { migrate } from './migrate.ts';
import { referenceProblems } from './references.ts';
import { documentLimits } from './documentLimits.ts';

/** One problem in a document, with the field path in `pathways[1].points[3].energy` form. */
export interface DocumentError {
  path: string;
  message: string;
}

export type LoadResult =
  | { ok: true; doc: Document; migratedFrom?: number }
  | { ok: false; errors: DocumentError[] };

/** Most errors reported at once; a broken huge file should not flood the screen. */
const MAX_ERRORS = 20;
/** Largest document text accepted (bytes of UTF-16 text, roughly). */
export const MAX_DOCUMENT_CHARS = 50_000_000;

/** `["pathways", 1, "points", 3]` -> `pathways[1].points[3]`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out || '(document)';
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let node: unknown = root;
  for (const key of path) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return node;
}

/** Adds the sibling unit to a number error ("expected a number in kcal/mol, ..."). */
function messageFor(issue: z.core.$ZodIssue, root: unknown): string {
  const last = issue.path[issue.path.length - 1];
  if (issue.code === 'unrecognized_keys') {
    return `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((k) => JSON.stringify(k)).join(', ')}`;
  }
  if (last === 'value' && issue.message.startsWith('expected a') && issue.message.includes('number')) {
    const unit = valueAt(root, [...issue.path.slice(0, -1), 'unit']);
    if (typeof unit === 'string') return issue.message.replace(/number/, `number in ${unit}`);
  }
  if (issue.code === 'invalid_type' && issue.message.startsWith('Invalid input')) {
    return `expected ${issue.expected}, got ${describe(valueAt(root, issue.path))}`;
  }
  return issue.message;
}

/** Validates an already-parsed JSON value (after migration). */
export function validateDocument(raw: unknown): LoadResult {
  const migrated = migrate(raw);
  if (!migrated.ok) {
    const field = /^(\w+): /.exec(migrated.message);
    return { ok: false, errors: [field ? { path: field[1]!, message: migrated.message.slice(field[0].length) } : { path: '(document)', message: migrated.message }] };
  }
  const parsed = Document.safeParse(migrated.doc);
  if (!parsed.success) {
    const errors = parsed.error.issues.slice(0, MAX_ERRORS).map((issue) => ({
      path: formatPath(issue.path),
      message: messageFor(issue, migrated.doc),
    }));
    return { ok: false, errors };
  }
  const problems = [...documentLimits(parsed.data), ...referenceProblems(parsed.data)];
  if (problems.length > 0) return { ok: false, errors: problems.slice(0, MAX_ERRORS) };
  return migrated.migratedFrom ? { ok: true, doc: parsed.data, migratedFrom: migrated.migratedFrom } : { ok: true, doc: parsed.data };
}

/** Parses `.passline` text. Never throws on user input. */
export function parseDocument(text: string): LoadResult {
  if (text.length > MAX_DOCUMENT_CHARS) {
    return { ok: false, errors: [{ path: '(document)', message: `file is too large (${text.length} characters; the limit is ${MAX_DOCUMENT_CHARS})` }] };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    return { ok: false, errors: [{ path: '(document)', message: `not valid JSON: ${(error as Error).message}` }] };
  }
  return validateDocument(raw);
}

/** Serialises a document (stable key order from the schema, two-space indent). */
export function serializeDocument(doc: Document): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/** Fills defaults of a hand-written document; throws on invalid input (for fixtures and tests). */
export function makeDocument(input: Omit<DocumentInput, 'format' | 'version'>): Document {
  const result = validateDocument({ format: 'passline', version: FORMAT_VERSION, ...input });
  if (!result.ok) throw new Error(result.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
  return result.doc;
}

/** One-line-per-error text for CLI and dialogs. */
export function formatErrors(errors: readonly DocumentError[]): string {
  return errors.map((e) => `${e.path}: ${e.message}`).join('\n');
}
