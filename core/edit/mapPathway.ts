import type { Document, Pathway, Point } from '../model/schema.ts';

/**
 * Replaces one pathway by `fn(pathway)`; the same document comes back when the pathway is
 * missing or `fn` returns it unchanged, so callers can ask "did anything change?" by identity.
 */
export function mapPathway(doc: Document, pathwayId: string, fn: (pathway: Pathway) => Pathway): Document {
  const index = doc.pathways.findIndex((p) => p.id === pathwayId);
  if (index < 0) return doc;
  const before = doc.pathways[index]!;
  const after = fn(before);
  if (after === before) return doc;
  const pathways = doc.pathways.slice();
  pathways[index] = after;
  return { ...doc, pathways };
}

/** Replaces one point of one pathway by `fn(point)`, keeping identity when nothing changes. */
export function mapPoint(doc: Document, pathwayId: string, pointId: string, fn: (point: Point) => Point): Document {
  return mapPathway(doc, pathwayId, (pathway) => {
    const index = pathway.points.findIndex((p) => p.id === pointId);
    if (index < 0) return pathway;
    const before = pathway.points[index]!;
    const after = fn(before);
    if (after === before) return pathway;
    const points = pathway.points.slice();
    points[index] = after;
    return { ...pathway, points };
  });
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
