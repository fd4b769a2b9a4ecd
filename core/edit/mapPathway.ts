import type { Document, Pathway, Point } from '../model/schema.ts';

/**
 * Replaces one pathway by `fn(pathway)`; the same document comes back when the pathway is
 * missing or `fn` returns it unchanged, so callers can ask "did anything change?" by identity.
 */
export function mapPathway(doc: Document, pathwayId: string, fn: (pathway: Pathway) => Pathway): Document {
  const pathways = replaceById(doc.pathways, pathwayId, fn);
  return pathways === doc.pathways ? doc : { ...doc, pathways };
}

/** Replaces one point of one pathway by `fn(point)`, keeping identity when nothing changes. */
export function mapPoint(doc: Document, pathwayId: string, pointId: string, fn: (point: Point) => Point): Document {
  return mapPathway(doc, pathwayId, (pathway) => {
    const points = replaceById(pathway.points, pointId, fn);
    return points === pathway.points ? pathway : { ...pathway, points };
  });
}

/** The array with the item of that id replaced by `fn(item)`; the same array when it is missing or unchanged. */
function replaceById<T extends { id: string }>(items: T[], id: string, fn: (item: T) => T): T[] {
  const index = items.findIndex((item) => item.id === id);
  if (index < 0) return items;
  const after = fn(items[index]!);
  if (after === items[index]) return items;
  const copy = items.slice();
  copy[index] = after;
  return copy;
}

/** Moves the item at `from` to `to` (clamped); the same array when the move is a no-op. */
export function moveItem<T>(items: readonly T[], from: number, to: number): readonly T[] {
  const target = Math.max(0, Math.min(items.length - 1, to));
  if (from < 0 || from >= items.length || target === from) return items;
  const out = items.slice();
  const [item] = out.splice(from, 1);
  out.splice(target, 0, item!);
  return out;
}
