import type { Document, Point, Reference, SpeciesTerm } from '../model/schema.ts';
import { pointComposition } from '../model/composition.ts';
import type { ResolveContext } from './context.ts';
import { formationSumJ } from './formationSum.ts';
import type { RawPoint } from './resolvePathway.ts';
import { resolveSpeciesState } from './resolveSpecies.ts';
import type { Scale } from './scale.ts';
import type { Finding } from './types.ts';

/** A state a pathway is measured from, with that state's energy in the document's frame. */
export interface Anchor {
  raw: RawPoint;
  point: Point;
  /** Energy of the anchor state on the common scale, J/mol. */
  energyJ: number;
  /** Which pathways share a zero: equal keys mean energies can be compared across pathways. */
  scaleKey: string;
}

/** What the energies of a resolved profile are measured from, for display and JSON. */
export interface ResolvedReference {
  kind: Reference['kind'];
  /** One sentence, e.g. "one document-wide zero: typed values as typed; species sums relative to “R” (Pathway A)". */
  text: string;
}

/** The raw value of the anchor state on `scale`: itself, or the formation sum of its composition. */
export function anchorOnScale(scale: Scale, anchor: { raw: RawPoint; point: Point }, ctx: ResolveContext): number | null {
  const raw = anchor.raw.raw;
  if (raw.scale === scale) return raw.valueJ;
  const terms = pointComposition(anchor.point);
  if (scale !== 'formation' || !terms) return null;
  const sum = formationSumJ(terms, ctx);
  return sum.ok ? sum.valueJ : null;
}

const canonical = (terms: readonly SpeciesTerm[]) => [...terms].map((t) => `${t.species}×${t.count}`).sort().join('+');

interface Frame {
  doc: Document;
  raws: RawPoint[][];
  ctx: ResolveContext;
  findings: Finding[];
  /** First point of the document on each non-relative scale (the `zero` reference's anchors). */
  documentAnchors: Map<Scale, { pathway: number; point: number }>;
}

/** The first state of the document on each absolute or formation scale, in document order. */
function documentAnchors(doc: Document, raws: RawPoint[][]): Frame['documentAnchors'] {
  const out: Frame['documentAnchors'] = new Map();
  raws.forEach((points, pi) => points.forEach((p, qi) => {
    if (p.raw.scale !== 'relative' && p.raw.valueJ !== null && !out.has(p.raw.scale)) out.set(p.raw.scale, { pathway: pi, point: qi });
  }));
  void doc;
  return out;
}

/** The species-sum reference's value on a scale, J/mol, or null. */
function speciesSumOn(scale: Scale, terms: readonly SpeciesTerm[], ctx: ResolveContext): number | null {
  if (scale === 'absolute') return resolveSpeciesState(terms, ctx, { pathway: '', point: '' }).raw.valueJ;
  if (scale === 'formation') { const s = formationSumJ(terms, ctx); return s.ok ? s.valueJ : null; }
  return 0;
}

function ownAnchor(pi: number, f: Frame): Anchor | null {
  const { doc, raws, ctx } = f;
  const first = raws[pi]![0];
  const point = doc.pathways[pi]!.points[0];
  if (!first || !point || first.raw.valueJ === null) return null;
  const ref = doc.settings.reference;
  const v = first.raw.valueJ;
  const scale = first.raw.scale;
  if (ref.kind === 'first') {
    const terms = pointComposition(point);
    const key = scale === 'relative' && v === 0 ? 'zero' : terms ? `state:${canonical(terms)}` : `pathway:${doc.pathways[pi]!.id}`;
    return { raw: first, point, energyJ: 0, scaleKey: key };
  }
  if (ref.kind === 'species') {
    const base = speciesSumOn(scale, ref.terms, ctx);
    return base === null ? null : { raw: first, point, energyJ: v - base, scaleKey: 'species' };
  }
  // zero
  if (scale === 'relative') return { raw: first, point, energyJ: v, scaleKey: 'zero' };
  const at = f.documentAnchors.get(scale)!;
  const a = raws[at.pathway]![at.point]!;
  return { raw: first, point, energyJ: v - (a.raw.valueJ as number), scaleKey: `zero:${scale}` };
}

/**
 * The anchor of every pathway under the document's reference rule (see `Settings.reference`),
 * with a pathway that branches from a point of another drawn from that point's energy (its
 * own scale key then follows the parent). A missing anchor gives null; branch loops and
 * branches from a point without energy give a finding.
 */
export function pathwayAnchors(doc: Document, raws: RawPoint[][], ctx: ResolveContext, findings: Finding[]): (Anchor | null)[] {
  const f: Frame = { doc, raws, ctx, findings, documentAnchors: documentAnchors(doc, raws) };
  const ref = doc.settings.reference;
  const memo = new Map<number, Anchor | null>();
  const visiting = new Set<number>();
  const anchorOf = (pi: number): Anchor | null => {
    if (memo.has(pi)) return memo.get(pi)!;
    const pathway = doc.pathways[pi]!;
    let result: Anchor | null;
    if (pathway.branch) {
      const branch = pathway.branch;
      const parent = doc.pathways.findIndex((p) => p.id === branch.pathway);
      const qi = parent < 0 ? -1 : doc.pathways[parent]!.points.findIndex((p) => p.id === branch.point);
      if (visiting.has(pi)) {
        findings.push({ severity: 'error', code: 'branch-loop', pathway: pathway.id, message: `pathway "${pathway.name}" branches from itself through other pathways; its energies cannot be placed` });
        result = null;
      } else {
        visiting.add(pi);
        const parentAnchor = parent >= 0 && qi >= 0 ? anchorOf(parent) : null;
        const at = parentAnchor ? pointEnergy(raws[parent]![qi]!, parentAnchor, ctx) : null;
        visiting.delete(pi);
        const first = raws[pi]![0];
        if (at === null || !first || first.raw.valueJ === null) {
          if (parentAnchor !== null || parent < 0) findings.push({ severity: 'error', code: 'branch-without-energy', pathway: pathway.id, message: `pathway "${pathway.name}" branches from "${branch.point}" of "${branch.pathway}", which has no energy` });
          result = null;
        } else result = { raw: first, point: pathway.points[0]!, energyJ: at, scaleKey: parentAnchor!.scaleKey };
      }
    } else if (ref.kind === 'point') {
      const pj = doc.pathways.findIndex((p) => p.id === ref.pathway);
      const qj = pj < 0 ? -1 : doc.pathways[pj]!.points.findIndex((p) => p.id === ref.point);
      const raw = qj >= 0 ? raws[pj]![qj]! : null;
      result = raw && raw.raw.valueJ !== null ? { raw, point: doc.pathways[pj]!.points[qj]!, energyJ: 0, scaleKey: 'point' } : null;
    } else result = ownAnchor(pi, f);
    memo.set(pi, result);
    return result;
  };
  return doc.pathways.map((_, pi) => anchorOf(pi));
}

/** A point's energy in the frame of `anchor`, J/mol, or null when their scales cannot be joined. */
export function pointEnergy(raw: RawPoint, anchor: Anchor, ctx: ResolveContext): number | null {
  if (raw.raw.valueJ === null) return null;
  const base = anchorOnScale(raw.raw.scale, anchor, ctx);
  return base === null ? null : anchor.energyJ + raw.raw.valueJ - base;
}

/** The sentence that says what the energies are measured from. */
export function describeReference(doc: Document, raws: RawPoint[][]): ResolvedReference {
  const ref = doc.settings.reference;
  const name = (pi: number, qi: number) => `"${doc.pathways[pi]!.points[qi]!.label}" (${doc.pathways[pi]!.name})`;
  if (ref.kind === 'first') return { kind: ref.kind, text: 'each pathway measured from its own first point; pathways are compared only where their first points are the same state' };
  if (ref.kind === 'point') {
    const pi = doc.pathways.findIndex((p) => p.id === ref.pathway);
    const qi = pi < 0 ? -1 : doc.pathways[pi]!.points.findIndex((p) => p.id === ref.point);
    return { kind: ref.kind, text: `every pathway measured from ${qi >= 0 ? name(pi, qi) : `"${ref.point}"`}` };
  }
  if (ref.kind === 'species') {
    const labels = new Map(doc.species.map((s) => [s.id, s.label]));
    return { kind: ref.kind, text: `every pathway measured from the species sum ${ref.terms.map((t) => `${t.count} × ${labels.get(t.species) ?? t.species}`).join(' + ')}` };
  }
  const anchors = documentAnchors(doc, raws);
  const parts = ['one document-wide zero: typed and stepwise values as typed'];
  const abs = anchors.get('absolute');
  const form = anchors.get('formation');
  if (abs) parts.push(`species sums relative to ${name(abs.pathway, abs.point)}`);
  if (form) parts.push(`formation sums relative to ${name(form.pathway, form.point)}`);
  return { kind: ref.kind, text: parts.join('; ') };
}
