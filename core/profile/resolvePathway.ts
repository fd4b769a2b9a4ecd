import type { Pathway } from '../model/schema.ts';
import type { Finding, Provenance } from './types.ts';
import type { RawEnergy } from './scale.ts';
import type { ResolveContext } from './context.ts';
import { resolveTyped } from './resolveTyped.ts';
import { resolveSpeciesState } from './resolveSpecies.ts';
import { resolveFormationState } from './resolveFormation.ts';
import { resolveEstimate } from './resolveEstimate.ts';

/** A point's energy before referencing. */
export interface RawPoint {
  raw: RawEnergy;
  provenance: Provenance;
}

function previousMinimumIndex(pathway: Pathway, index: number): number {
  for (let i = index - 1; i >= 0; i--) if (pathway.points[i]!.kind === 'min') return i;
  return -1;
}

function nextMinimumIndex(pathway: Pathway, index: number): number {
  for (let i = index + 1; i < pathway.points.length; i++) if (pathway.points[i]!.kind === 'min') return i;
  return -1;
}

/**
 * Raw energies of one pathway's points, in order. Estimates come last because Marcus
 * and Bell–Evans–Polanyi need the minima on both sides of the transition state.
 */
export function resolvePathwayRaw(pathway: Pathway, ctx: ResolveContext, findings: Finding[]): RawPoint[] {
  const out: (RawPoint | undefined)[] = new Array(pathway.points.length);
  const neighbour = (i: number) => (i < 0 ? null : { raw: out[i]!.raw, label: pathway.points[i]!.label });
  pathway.points.forEach((point, i) => {
    const where = { pathway: pathway.id, point: point.id };
    const spec = point.energy;
    if (spec.mode === 'estimate') return;
    let result: RawPoint & { findings: Finding[] };
    if (spec.mode === 'species') result = resolveSpeciesState(spec.terms, ctx, where);
    else if (spec.mode === 'formation') result = resolveFormationState(spec.terms, ctx, where);
    else result = resolveTyped(spec, { quantity: ctx.quantity, previousMinimum: neighbour(previousMinimumIndex(pathway, i)), where });
    findings.push(...result.findings);
    out[i] = { raw: result.raw, provenance: result.provenance };
  });
  pathway.points.forEach((point, i) => {
    if (point.energy.mode !== 'estimate') return;
    const where = { pathway: pathway.id, point: point.id };
    const result = resolveEstimate(point.energy.estimate, point.kind, {
      ctx, where,
      before: neighbour(previousMinimumIndex(pathway, i)),
      after: neighbour(nextMinimumIndex(pathway, i)),
    });
    findings.push(...result.findings);
    out[i] = { raw: result.raw, provenance: result.provenance };
  });
  return out as RawPoint[];
}
