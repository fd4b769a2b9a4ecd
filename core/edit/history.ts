import type { Document } from '../model/schema.ts';

/**
 * Undo history as a value: past documents, the present one and undone ones. Snapshots are
 * cheap here because edits share every unchanged part of the document.
 */
export interface History {
  readonly past: readonly Document[];
  readonly present: Document;
  readonly future: readonly Document[];
  /** Group of the last recorded edit and when it was recorded (ms), for merging bursts. */
  readonly group: string | null;
  readonly at: number;
}

/** How one edit joins the history. */
export interface RecordOptions {
  /** Edits with the same group (a drag, typing into one field) within `windowMs` merge into one undo step. */
  group?: string;
  /** Time of the edit in ms (default Date.now()). */
  now?: number;
  /** Largest gap between grouped edits (default 1500 ms). */
  windowMs?: number;
}

/** Undo steps kept; older ones are dropped. */
export const HISTORY_LIMIT = 300;

/** A history that starts at `doc` with nothing to undo. */
export function startHistory(doc: Document): History {
  return { past: [], present: doc, future: [], group: null, at: 0 };
}

/** Records `doc` as the new present; the same history back when `doc` is already the present. */
export function record(history: History, doc: Document, options: RecordOptions = {}): History {
  if (doc === history.present) return history;
  const now = options.now ?? Date.now();
  const group = options.group ?? null;
  const merge = group !== null && group === history.group && now - history.at <= (options.windowMs ?? 1500) && history.past.length > 0;
  const past = merge ? history.past : [...history.past, history.present].slice(-HISTORY_LIMIT);
  return { past, present: doc, future: [], group, at: now };
}

/** Steps back one edit (the same history when there is nothing to undo). */
export function undo(history: History): History {
  const previous = history.past.at(-1);
  if (!previous) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future], group: null, at: 0 };
}

/** Re-applies the last undone edit (the same history when there is none). */
export function redo(history: History): History {
  const next = history.future[0];
  if (!next) return history;
  return { past: [...history.past, history.present], present: next, future: history.future.slice(1), group: null, at: 0 };
}

/** Ends the current group so that the next edit starts a new undo step (e.g. at pointer up or blur). */
export function closeGroup(history: History): History {
  return history.group === null ? history : { ...history, group: null };
}
