import type { Document } from '../model/schema.ts';
import { makeContext } from './context.ts';
import { resolvePathwayRaw } from './resolvePathway.ts';
import type { Finding, ResolvedPathway, ResolvedProfile } from './types.ts';
import { runChecks } from './checks/index.ts';
import { describeReference, pathwayAnchors, pointEnergy } from './referenceFrame.ts';

/**
 * Resolves every point of every pathway to one energy (J/mol) in the document's quantity,
 * temperature and standard state, relative to the reference state, with provenance and
 * consistency findings. Pure: the document is not changed. What "relative to" means is the
 * document's reference rule (`referenceFrame.ts`); the profile states it and gives each
 * pathway a scale key, equal for pathways whose energies share one zero.
 */
export function resolveProfile(doc: Document): ResolvedProfile {
  const ctx = makeContext(doc);
  const findings: Finding[] = [];
  const raws = doc.pathways.map((pathway) => resolvePathwayRaw(pathway, ctx, findings));
  // Points that already have an error get no second "missing energy" finding (a set: huge documents stay linear).
  const erred = new Set(findings.filter((f) => f.severity === 'error').map((f) => `${f.pathway}\u0000${f.point}`));
  const anchors = pathwayAnchors(doc, raws, ctx, findings);
  const pathways: ResolvedPathway[] = doc.pathways.map((pathway, pi) => {
    const anchor = anchors[pi] ?? null;
    return {
      id: pathway.id,
      name: pathway.name,
      cycle: pathway.cycle,
      scaleKey: anchor?.scaleKey ?? `pathway:${pathway.id}`,
      points: pathway.points.map((point, qi) => {
        const raw0 = raws[pi]![qi]!;
        const { raw, provenance } = raw0;
        const where = { pathway: pathway.id, point: point.id };
        let energyJ: number | null = null;
        if (raw.valueJ !== null && anchor) {
          energyJ = pointEnergy(raw0, anchor, ctx);
          if (energyJ === null) {
            erred.add(`${pathway.id}\u0000${point.id}`);
            findings.push({
              severity: 'error', code: 'no-common-reference', ...where,
              message: `this point is on the ${raw.scale} scale but the reference "${anchor.point.label}" is on the ${anchor.raw.raw.scale} scale${raw.scale === 'formation' ? ' and has no composition with formation data' : ''}; they cannot be subtracted`,
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
  findings.push(...rezeroed(doc, raws));
  findings.push(...runChecks(doc, pathways, ctx));
  return { quantity: doc.settings.quantity, unit: doc.settings.unit, temperatureK: doc.settings.temperatureK, reference: describeReference(doc, raws), pathways, findings };
}

/** Under the per-pathway reference a typed first value other than 0 is drawn at 0: say so. */
function rezeroed(doc: Document, raws: ReturnType<typeof resolvePathwayRaw>[]): Finding[] {
  if (doc.settings.reference.kind !== 'first') return [];
  return doc.pathways.flatMap((pathway, pi) => {
    const first = raws[pi]![0];
    const point = pathway.points[0];
    if (!first || !point || pathway.branch || first.raw.scale !== 'relative' || !first.raw.valueJ) return [];
    return [{ severity: 'info' as const, code: 'first-point-rezeroed', pathway: pathway.id, point: point.id, message: `"${point.label}" is typed as ${first.provenance.detail} but drawn at 0: this document measures each pathway from its own first point (choose the document-wide zero to show typed values as typed)` }];
  });
}
