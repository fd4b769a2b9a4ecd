import type { Document, EnergySpec, Point, PointKind } from '../model/schema.ts';
import { EnergySpec as EnergySpecSchema } from '../model/schema.ts';
import { mapPathway, mapPoint, moveItem } from './mapPathway.ts';
import { uniqueId } from './uniqueId.ts';
import { withMoleculeText } from './moleculeEdits.ts';

/** Where a point lives. */
export interface PointRef {
  pathway: string;
  point: string;
}

/**
 * Inserts a point into a pathway at `index` (default: the end). Without `point` a new
 * minimum typed as 0 in the display unit is made, labelled "P<n>". The id is made unique.
 */
export function insertPoint(doc: Document, args: { pathway: string; index?: number; point?: Omit<Point, 'id'> & { id?: string } }): Document {
  return mapPathway(doc, args.pathway, (pathway) => {
    const ids = pathway.points.map((p) => p.id);
    const label = args.point?.label ?? `P${pathway.points.length + 1}`;
    const point: Point = {
      label, kind: 'min', energy: { mode: 'value', value: 0, unit: doc.settings.unit },
      ...args.point,
      id: uniqueId(args.point?.id ?? label, ids),
    };
    const at = Math.max(0, Math.min(pathway.points.length, args.index ?? pathway.points.length));
    return { ...pathway, points: [...pathway.points.slice(0, at), point, ...pathway.points.slice(at)] };
  });
}

/**
 * Removes a point, with the barrier annotations that name it; a shared reference at the
 * point falls back to the document-wide zero (the document must stay loadable); a pathway
 * that branched from the point keeps its points on that zero.
 */
export function deletePoint(doc: Document, ref: PointRef): Document {
  const next = mapPathway(doc, ref.pathway, (pathway) => {
    const points = pathway.points.filter((p) => p.id !== ref.point);
    return points.length === pathway.points.length ? pathway : { ...pathway, points };
  });
  if (next === doc) return doc;
  const names = (a: Document['figure']['annotations'][number]) => a.type === 'barrier' && a.pathway === ref.pathway && (a.from === ref.point || a.to === ref.point);
  const r = doc.settings.reference;
  const atPoint = r.kind === 'point' && r.pathway === ref.pathway && r.point === ref.point;
  const unbranched = next.pathways.some((p) => p.branch?.pathway === ref.pathway && p.branch.point === ref.point)
    ? next.pathways.map((p) => (p.branch?.pathway === ref.pathway && p.branch.point === ref.point ? (({ branch: _b, ...rest }) => rest)(p) : p))
    : next.pathways;
  return {
    ...next,
    pathways: unbranched,
    figure: doc.figure.annotations.some(names) ? { ...doc.figure, annotations: doc.figure.annotations.filter((a) => !names(a)) } : doc.figure,
    settings: atPoint ? { ...doc.settings, reference: { kind: 'zero' } } : doc.settings,
  };
}

/** Copies a point right after itself, labelled "<label> copy", without its layout overrides. */
export function duplicatePoint(doc: Document, ref: PointRef): Document {
  const pathway = doc.pathways.find((p) => p.id === ref.pathway);
  const index = pathway?.points.findIndex((p) => p.id === ref.point) ?? -1;
  if (!pathway || index < 0) return doc;
  const { x: _x, labelOffsetMm: _o, ...copy } = pathway.points[index]!;
  return insertPoint(doc, { pathway: ref.pathway, index: index + 1, point: { ...copy, label: `${copy.label} copy` } });
}

/** Moves a point to position `to` within its pathway. */
export function movePoint(doc: Document, args: PointRef & { to: number }): Document {
  return mapPathway(doc, args.pathway, (pathway) => {
    const points = moveItem(pathway.points, pathway.points.findIndex((p) => p.id === args.point), args.to);
    return points === pathway.points ? pathway : { ...pathway, points: points as Point[] };
  });
}

/** Sets a point's kind (minimum or transition state). */
export function setKind(doc: Document, args: PointRef & { kind: PointKind }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => (p.kind === args.kind ? p : { ...p, kind: args.kind }));
}

/** Sets a point's label. */
export function setLabel(doc: Document, args: PointRef & { label: string }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => (p.label === args.label ? p : { ...p, label: args.label }));
}

/**
 * Sets the structure drawn beside a point's level from pasted or dropped text (SMILES,
 * molfile or XYZ, format guessed; a file name helps), or removes it when the text is blank.
 * It wins over the drawings of the species the state is made of.
 */
export function setPointMolecule(doc: Document, args: PointRef & { text: string; fileName?: string }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => withMoleculeText(p, args));
}

/**
 * Which side of its level a point's drawing goes: 'above' or 'below', or undefined to follow
 * the figure's choice (figure.molecules.side).
 */
export function setMoleculeSide(doc: Document, args: PointRef & { side: 'above' | 'below' | undefined }): Document {
  return mapPoint(doc, args.pathway, args.point, (p) => {
    if (p.moleculeSide === args.side) return p;
    const { moleculeSide: _, ...rest } = p;
    return args.side === undefined ? rest : { ...rest, moleculeSide: args.side };
  });
}

/**
 * Sets how a point's energy is given. An energy the schema would refuse (a NaN, an empty
 * species list) leaves the document as it is; use {@link energyProblem} to say why.
 */
export function setEnergy(doc: Document, args: PointRef & { energy: EnergySpec }): Document {
  if (energyProblem(args.energy)) return doc;
  return mapPoint(doc, args.pathway, args.point, (p) => (JSON.stringify(p.energy) === JSON.stringify(args.energy) ? p : { ...p, energy: args.energy }));
}

/** Why an energy specification is not acceptable, or null when it is. */
export function energyProblem(energy: EnergySpec): string | null {
  const parsed = EnergySpecSchema.safeParse(energy);
  if (parsed.success) return null;
  const issue = parsed.error.issues[0]!;
  return `${issue.path.join('.') || 'energy'}: ${issue.message}`;
}
