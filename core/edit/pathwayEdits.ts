import type { Comparison, Document, Pathway, PathwayStyle } from '../model/schema.ts';
import { mapPathway, moveItem } from './mapPathway.ts';
import { uniqueId } from './uniqueId.ts';

/** Adds a pathway at `index` (default: the end): a given one, or an empty one named "Pathway <n>". */
export function insertPathway(doc: Document, args: { index?: number; pathway?: Omit<Pathway, 'id'> & { id?: string } } = {}): Document {
  const name = args.pathway?.name ?? `Pathway ${doc.pathways.length + 1}`;
  const pathway: Pathway = {
    name, cycle: false, style: { visible: true }, points: [],
    ...args.pathway,
    id: uniqueId(args.pathway?.id ?? name, doc.pathways.map((p) => p.id)),
  };
  const at = Math.max(0, Math.min(doc.pathways.length, args.index ?? doc.pathways.length));
  return { ...doc, pathways: [...doc.pathways.slice(0, at), pathway, ...doc.pathways.slice(at)] };
}

/**
 * Removes a pathway, with the comparisons and figure annotations that name it (they
 * would otherwise point at nothing and the document would no longer load).
 */
export function deletePathway(doc: Document, args: { pathway: string }): Document {
  const id = args.pathway;
  if (!doc.pathways.some((p) => p.id === id)) return doc;
  const comparisons = doc.comparisons.flatMap((c): Comparison[] => {
    if (c.type === 'rate') return c.baseline === id || c.candidate === id ? [] : [c];
    const rest = c.pathways.filter((p) => p !== id);
    return rest.length === c.pathways.length ? [c] : rest.length >= 2 ? [{ ...c, pathways: rest }] : [];
  });
  const annotations = doc.figure.annotations.filter((a) => a.type === 'text' || a.pathway !== id);
  const reference = doc.settings.reference.kind === 'point' && doc.settings.reference.pathway === id ? { kind: 'zero' as const } : doc.settings.reference;
  return {
    ...doc,
    // A pathway that branched from the removed one keeps its points on the document zero.
    pathways: doc.pathways.filter((p) => p.id !== id).map((p) => (p.branch?.pathway === id ? (({ branch: _b, ...rest }) => rest)(p) : p)),
    comparisons,
    figure: { ...doc.figure, annotations },
    settings: reference === doc.settings.reference ? doc.settings : { ...doc.settings, reference },
  };
}

/** Copies a pathway right after itself as "<name> copy". */
export function duplicatePathway(doc: Document, args: { pathway: string }): Document {
  const index = doc.pathways.findIndex((p) => p.id === args.pathway);
  if (index < 0) return doc;
  const { id: _id, ...copy } = doc.pathways[index]!;
  return insertPathway(doc, { index: index + 1, pathway: { ...copy, name: `${copy.name} copy` } });
}

/** Moves a pathway to position `to`. */
export function movePathway(doc: Document, args: { pathway: string; to: number }): Document {
  const pathways = moveItem(doc.pathways, doc.pathways.findIndex((p) => p.id === args.pathway), args.to);
  return pathways === doc.pathways ? doc : { ...doc, pathways: pathways as Pathway[] };
}

/** Renames a pathway. */
export function setPathwayName(doc: Document, args: { pathway: string; name: string }): Document {
  return mapPathway(doc, args.pathway, (p) => (p.name === args.name ? p : { ...p, name: args.name }));
}

/** Marks a pathway as a catalytic cycle (its last point is the regenerated first state) or not. */
export function setCycle(doc: Document, args: { pathway: string; cycle: boolean }): Document {
  return mapPathway(doc, args.pathway, (p) => (p.cycle === args.cycle ? p : { ...p, cycle: args.cycle }));
}

/** Changes a pathway's colour, dash or visibility; `colour: null` returns to the theme's palette. */
export function setStyle(doc: Document, args: { pathway: string; style: Partial<Omit<PathwayStyle, 'colour'>> & { colour?: string | null } }): Document {
  return mapPathway(doc, args.pathway, (p) => {
    const { colour, ...rest } = args.style;
    if (colour !== undefined && colour !== null && !/^#[0-9a-fA-F]{6}$/.test(colour)) return p;
    const next: PathwayStyle = { ...p.style, ...rest };
    if (colour === null) delete next.colour;
    else if (colour !== undefined) next.colour = colour.toLowerCase();
    const same = next.colour === p.style.colour && next.dash === p.style.dash && next.visible === p.style.visible;
    return same ? p : { ...p, style: next };
  });
}
