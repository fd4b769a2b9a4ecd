import type { Document } from '../model/schema.ts';
import { makeContext } from './context.ts';
import { resolvePathwayRaw, type RawPoint } from './resolvePathway.ts';
import type { Finding, ResolvedPathway, ResolvedProfile } from './types.ts';
import { runChecks } from './checks/index.ts';
import { formationSumJ } from './formationSum.ts';
import { pointComposition } from '../model/composition.ts';
import type { ResolveContext } from './context.ts';
import type { Point } from '../model/schema.ts';

/**
 * The reference energy a point is measured from. A formation-scale point (Hess's law) in a
 * pathway whose reference is on another scale is anchored to the formation sum of the
 * reference state's composition, so a pathway's end can be pinned to its Hess value.
 */
function referenceValue(scale: RawPoint['raw']['scale'], reference: { raw: RawPoint; point: Point }, ctx: ResolveContext): number | null {
  const raw = reference.raw.raw;
  if (raw.scale === scale) return raw.valueJ;
  const terms = pointComposition(reference.point);
  if (scale !== 'formation' || !terms) return null;
  const sum = formationSumJ(terms, ctx);
  return sum.ok ? sum.valueJ : null;
}

function referenceFor(doc: Document, pathwayIndex: number, raws: RawPoint[][]): { raw: RawPoint; point: Point } | null {
  const ref = doc.settings.reference;
  if (ref.kind === 'point') {
    const pi = doc.pathways.findIndex((p) => p.id === ref.pathway);
    const qi = pi < 0 ? -1 : doc.pathways[pi]!.points.findIndex((p) => p.id === ref.point);
    if (qi >= 0) return { raw: raws[pi]![qi]!, point: doc.pathways[pi]!.points[qi]! };
    return null;
  }
  const first = raws[pathwayIndex]![0];
  return first ? { raw: first, point: doc.pathways[pathwayIndex]!.points[0]! } : null;
}

/**
 * Resolves every point of every pathway to one energy (J/mol) in the document's quantity,
 * temperature and standard state, relative to the reference state, with provenance and
 * consistency findings. Pure: the document is not changed.
 */
export function resolveProfile(doc: Document): ResolvedProfile {
  const ctx = makeContext(doc);
  const findings: Finding[] = [];
  const raws = doc.pathways.map((pathway) => resolvePathwayRaw(pathway, ctx, findings));
  // Points that already have an error get no second "missing energy" finding (a set: huge documents stay linear).
  const erred = new Set(findings.filter((f) => f.severity === 'error').map((f) => `${f.pathway}\u0000${f.point}`));
  const pathways: ResolvedPathway[] = doc.pathways.map((pathway, pi) => {
    const reference = referenceFor(doc, pi, raws);
    return {
      id: pathway.id,
      name: pathway.name,
      cycle: pathway.cycle,
      points: pathway.points.map((point, qi) => {
        const { raw, provenance } = raws[pi]![qi]!;
        const where = { pathway: pathway.id, point: point.id };
        let energyJ: number | null = null;
        if (raw.valueJ !== null && reference && reference.raw.raw.valueJ !== null) {
          const base = referenceValue(raw.scale, reference, ctx);
          if (base !== null) energyJ = raw.valueJ - base;
          else {
            erred.add(`${pathway.id}\u0000${point.id}`);
            findings.push({
              severity: 'error', code: 'no-common-reference', ...where,
              message: `this point is on the ${raw.scale} scale but the reference "${reference.point.label}" is on the ${reference.raw.raw.scale} scale${raw.scale === 'formation' ? ' and has no composition with formation data' : ''}; they cannot be subtracted`,
            });
          }
        }
        if (energyJ === null && !erred.has(`${pathway.id}\u0000${point.id}`)) {
          findings.push({ severity: 'error', code: 'missing-energy', ...where, message: `no energy could be resolved for "${point.label}"` });
        }
        return { id: point.id, label: point.label, kind: point.kind, energyJ, provenance };
      }),
    };
  });
  findings.push(...runChecks(doc, pathways, ctx));
  return { quantity: doc.settings.quantity, unit: doc.settings.unit, temperatureK: doc.settings.temperatureK, pathways, findings };
}
