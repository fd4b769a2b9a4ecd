import type { Document, Pathway } from '../../model/schema.ts';
import type { Finding, ResolvedProfile } from '../types.ts';

/**
 * An entry typed in the editor that could not become document data (a species sum naming
 * an unknown id, a number outside its bounds). The document keeps its last valid value, so
 * the point must not show that value as if it were current.
 */
export interface UnresolvedInput {
  pathway: string;
  point: string;
  /** What was being typed, for messages ("species sum", "energy"). */
  field: string;
  text: string;
  /** Why it does not resolve. */
  message: string;
}

/** Provenance detail of a point measured from an unresolved one. */
export const RESTS_ON_UNRESOLVED = 'rests on an unresolved input (its reference or the minimum it is measured from)';

function previousMinimum(pathway: Pathway, index: number): number {
  for (let i = index - 1; i >= 0; i--) if (pathway.points[i]!.kind === 'min') return i;
  return -1;
}

function nextMinimum(pathway: Pathway, index: number): number {
  for (let i = index + 1; i < pathway.points.length; i++) if (pathway.points[i]!.kind === 'min') return i;
  return -1;
}

/** Point ids of `pathway` whose energy rests on one of `own` (steps and barriers over it, estimates beside it). */
function dependents(pathway: Pathway, own: ReadonlySet<string>): Set<string> {
  const out = new Set<string>();
  pathway.points.forEach((point, i) => {
    const before = pathway.points[previousMinimum(pathway, i)]?.id;
    const after = pathway.points[nextMinimum(pathway, i)]?.id;
    const mode = point.energy.mode;
    const leansOn = (id: string | undefined) => id !== undefined && (own.has(id) || out.has(id));
    if (own.has(point.id)
      || ((mode === 'step' || mode === 'barrier') && leansOn(before))
      || (mode === 'estimate' && (leansOn(before) || leansOn(after)))) out.add(point.id);
  });
  return out;
}

/**
 * The profile with every point that rests on an unresolved input shown as unresolved
 * (energy null, provenance naming the input), including points measured from it and, when
 * it is the reference, the whole pathway; plus one error finding per input. The same
 * profile back when there are none.
 */
export function markUnresolved(doc: Document, profile: ResolvedProfile, inputs: readonly UnresolvedInput[]): ResolvedProfile {
  if (inputs.length === 0) return profile;
  const ref = doc.settings.reference;
  const byPathway = new Map<string, Set<string>>();
  for (const input of inputs) byPathway.set(input.pathway, (byPathway.get(input.pathway) ?? new Set()).add(input.point));
  const sharedReferenceLost = ref.kind === 'point' && byPathway.get(ref.pathway)?.has(ref.point) === true;
  const findings: Finding[] = [];
  const pathways = profile.pathways.map((resolved, pi) => {
    const pathway = doc.pathways[pi]!;
    const marked = dependents(pathway, byPathway.get(pathway.id) ?? new Set());
    const referenceId = ref.kind === 'point' ? null : pathway.points[0]?.id;
    const all = sharedReferenceLost || (referenceId !== undefined && referenceId !== null && marked.has(referenceId));
    if (!all && marked.size === 0) return resolved;
    return {
      ...resolved,
      points: resolved.points.map((point) => {
        if (!all && !marked.has(point.id)) return point;
        const input = inputs.find((i) => i.pathway === pathway.id && i.point === point.id);
        const detail = input ? `unresolved ${input.field} "${input.text}": ${input.message}` : RESTS_ON_UNRESOLVED;
        return { ...point, energyJ: null, provenance: { route: 'missing' as const, detail, approximations: [] } };
      }),
    };
  });
  for (const input of inputs) {
    const label = doc.pathways.find((p) => p.id === input.pathway)?.points.find((p) => p.id === input.point)?.label.trim() || 'a point without a label';
    findings.push({ severity: 'error', code: 'unresolved-input', pathway: input.pathway, point: input.point,
      message: `the ${input.field} of "${label}" reads "${input.text}", which does not resolve: ${input.message}; the point has no energy until it is fixed` });
  }
  return { ...profile, pathways, findings: [...findings, ...profile.findings] };
}
