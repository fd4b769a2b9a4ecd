import { energeticSpan } from '../kinetics/energeticSpan.ts';
import type { Document } from '../model/schema.ts';
import type { Finding, ResolvedProfile } from '../profile/types.ts';
import { fromJoulesPerMol } from '../units/energy.ts';
import { collectPoints, type LayoutPathway, type LayoutPoint } from './collectPoints.ts';

/** A point of a drawn pathway with a known energy. */
export type KnownPoint = LayoutPoint & { energy: number };

/**
 * An annotation resolved to drawn points and display-unit energies, before any geometry.
 * `annotation` is its index in `doc.figure.annotations` (from 0).
 * Free text: `slot` is in slot units (0 = the first slot, as a point's `x`), `energy` in the
 * profile's display unit; the text is centred there.
 */
export type AnnotationPlan =
  | { kind: 'barrier'; annotation: number; from: KnownPoint; to: KnownPoint; value: number }
  | {
    kind: 'span'; annotation: number; pathwayId: string; tdi: KnownPoint; tdts: KnownPoint; tdtsLabel: string;
    /** Energies of the bracket's ends: the TDI, and the TDTS (of the next turnover when `wrap`). */
    low: number; high: number; deltaE: number;
    /** True when the TDTS comes before the TDI: the bracket reaches the TDTS of the next turnover, T + ΔG_r. */
    wrap: boolean;
  }
  | { kind: 'text'; annotation: number; text: string; slot: number; energy: number };

/**
 * Resolves `doc.figure.annotations` against the drawn pathways. An annotation that names
 * a missing or hidden pathway or point, a point of unknown energy, or a span of a pathway
 * that is not a readable catalytic cycle is left out with a finding naming it. The span is
 * the energetic span model's (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011)): TDI, TDTS, δE.
 */
export function planAnnotations(profile: ResolvedProfile, doc: Document, pathways: readonly LayoutPathway[]): { plans: AnnotationPlan[]; findings: Finding[]; reasons: Map<number, string> } {
  const plans: AnnotationPlan[] = [];
  const findings: Finding[] = [];
  const reasons = new Map<number, string>();
  const unit = profile.unit;
  doc.figure.annotations.forEach((a, n) => {
    const where = `figure annotation ${n + 1} (${a.type})`;
    const fail = (code: string, message: string, pathway?: string, point?: string) => {
      reasons.set(n, message);
      findings.push({ severity: 'warning', code, message: `${where}: ${message}; it is not drawn`, ...(pathway ? { pathway } : {}), ...(point ? { point } : {}) });
    };
    if (a.type === 'text') {
      plans.push({ kind: 'text', annotation: n, text: a.text, slot: a.x, energy: a.y });
      return;
    }
    const drawn = pathways.find((p) => p.id === a.pathway);
    if (!drawn) {
      const hidden = doc.pathways.find((p) => p.id === a.pathway);
      fail(hidden ? 'annotation-pathway-hidden' : 'annotation-unknown-pathway', hidden ? `pathway "${hidden.name || hidden.id}" is hidden` : `there is no pathway "${a.pathway}"`, hidden ? a.pathway : undefined);
      return;
    }
    const known = (id: string): KnownPoint | string => {
      const p = drawn.points.find((q) => q.pointId === id);
      if (!p) return `pathway "${drawn.name}" has no point "${id}"`;
      return p.energy === null ? `the energy of "${p.label}" is unknown` : (p as KnownPoint);
    };
    if (a.type === 'barrier') {
      const from = known(a.from);
      const to = known(a.to);
      if (typeof from === 'string') return fail('annotation-point', from, a.pathway, a.from);
      if (typeof to === 'string') return fail('annotation-point', to, a.pathway, a.to);
      plans.push({ kind: 'barrier', annotation: n, from, to, value: to.energy - from.energy });
      return;
    }
    const resolved = profile.pathways.find((p) => p.id === a.pathway)!;
    if (!resolved.cycle) return fail('annotation-not-cycle', `pathway "${drawn.name}" is not marked as a catalytic cycle`, a.pathway);
    const { span, findings: why } = energeticSpan(resolved, { temperatureK: profile.temperatureK, transmission: doc.settings.transmission });
    if (!span) return fail('annotation-span', why.find((f) => f.severity === 'error')?.message ?? 'the energetic span could not be computed', a.pathway);
    const tdi = known(span.tdi.id);
    // A barrierless TDTS ("a→b") stands at the higher of its two minima: anchor the bracket there.
    const tdtsId = drawn.points.some((q) => q.pointId === span.tdts.id) ? span.tdts.id : higherOf(drawn, span.tdts.id);
    const tdts = known(tdtsId);
    if (typeof tdi === 'string' || typeof tdts === 'string') return fail('annotation-span', 'its TDI or TDTS is not drawn', a.pathway);
    const deltaE = fromJoulesPerMol(span.deltaEJ, unit);
    plans.push({ kind: 'span', annotation: n, pathwayId: a.pathway, tdi, tdts, tdtsLabel: span.tdts.label, low: tdi.energy, high: tdi.energy + deltaE, deltaE, wrap: !span.tdtsAfterTdi });
  });
  return { plans, findings, reasons };
}

function higherOf(pathway: LayoutPathway, barrierlessId: string): string {
  const pts = pathway.points;
  for (let k = 1; k < pts.length; k++) {
    const [a, b] = [pts[k - 1]!, pts[k]!];
    if (`${a.pointId}→${b.pointId}` === barrierlessId) return (b.energy ?? -Infinity) > (a.energy ?? -Infinity) ? b.pointId : a.pointId;
  }
  return barrierlessId;
}

/** Energies an annotation needs on the page (the scale is widened to show them). */
export function planEnergies(plans: readonly AnnotationPlan[]): number[] {
  return plans.flatMap((p) => (p.kind === 'span' ? [p.low, p.high] : p.kind === 'text' ? [p.energy] : []));
}

/** Why each annotation that cannot be drawn is left out, by its index in `doc.figure.annotations` (for the annotation list). */
export function annotationProblems(profile: ResolvedProfile, doc: Document): ReadonlyMap<number, string> {
  return planAnnotations(profile, doc, collectPoints(profile, doc)).reasons;
}

/** Why annotations of the document cannot be drawn (empty when all can): for the findings list. */
export function annotationFindings(profile: ResolvedProfile, doc: Document): Finding[] {
  return planAnnotations(profile, doc, collectPoints(profile, doc)).findings;
}
