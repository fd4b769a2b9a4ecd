import type { DocumentAnalysis } from '../analysis/analyseDocument.ts';
import type { Document, Quantity, Unit } from '../model/schema.ts';
import type { Finding, Provenance } from '../profile/types.ts';
import type { PointRef } from '../kinetics/types.ts';
import type { KineticStep } from '../kinetics/stepKinetics.ts';
import type { EnergeticSpan as EnergeticSpanResult } from '../kinetics/energeticSpan.ts';
import { fromJoulesPerMol } from '../units/energy.ts';
import { rateStandardState } from '../analysis/rateStandardState.ts';

/** A point as printed by `analyze --json`: energy in the display unit. */
export interface ReportPoint { label: string; kind: 'min' | 'ts'; energy: number | null; provenance: Provenance }

export interface ReportStep {
  from: string; ts: string | null; to: string;
  barrierForward: number | null; barrierReverse: number | null; reactionEnergy: number | null;
  kForward: number | null; kReverse: number | null; kForwardUnit: string; kReverseUnit: string;
  equilibriumConstant: number | null; halfLifeSeconds: number | null; barrierless: boolean; negativeBarrier: boolean;
  /** The forward barrier k uses: the TS raised to the higher neighbouring minimum where it lies below one. */
  barrierUsed: number | null;
}

export interface ReportPathway {
  name: string;
  cycle: boolean;
  points: ReportPoint[];
  steps: ReportStep[];
  effectiveBarrier: {
    value: number; ts: string; intermediate: string; halfLifeSeconds: number | null; reading: string | null;
    /** The TS was raised to a neighbouring minimum (the rule the step rates use). */
    tsRaised: boolean;
    /** True when nothing on the pathway rises above an earlier minimum (every step downhill and barrierless). */
    noBarrier: boolean;
    /** What the half-life assumes. */
    halfLifeOrder: string;
  } | null;
  /** Pathways with equal values share one zero. */
  scale: string;
  reactionEnergy: number | null;
  energeticSpan: null | {
    deltaE: number; tdts: string; tdi: string; tof: number; tofApprox: number; apparentBarrier: number | null;
    reactionEnergy: number; degreeOfTofControl: Record<string, number>; convention: string;
  };
}

export type ReportComparison =
  | { type: 'rate'; baseline: string; candidate: string; ddG: number | null; rateRatio: number | null; log10RateRatio: number | null }
  | {
    type: 'selectivity'; pathways: string[]; assumption: string | null; products: { pathway: string; percent: number; effectiveTs: number }[]; ratio: number | null; ddG: number | null; er: number | null; ee: number | null;
    /** The two products `ratio` and `ddG` are about ([first]/[second]): the two major ones. */
    ratioOf: [string, string] | null; major: string | null; minor: string | null;
  };

/** The machine-readable analysis of a document (the `analyze --json` contract). */
export interface AnalysisReport {
  title: string;
  quantity: Quantity;
  unit: Unit;
  temperatureK: number;
  /** What every energy is measured from. */
  reference: { kind: string; text: string };
  /** The standard state every k and K refers to. */
  standardState: string;
  pathways: ReportPathway[];
  comparisons: ReportComparison[];
  checks: Finding[];
}

/** Labels are shown as written; a label that repeats in a cycle's X_TOF table gets its id. */
function controlKey(ref: PointRef, taken: ReadonlySet<string>): string {
  return taken.has(ref.label) ? `${ref.label} (${ref.id})` : ref.label;
}

/** The keys of a cycle's X_TOF table, TSs then intermediates, in the order of `span.transitionStates, span.intermediates`. */
export function controlKeys(span: Pick<EnergeticSpanResult, 'transitionStates' | 'intermediates'>): string[] {
  const taken = new Set<string>();
  return [...span.transitionStates, ...span.intermediates].map((s) => { const k = controlKey(s, taken); taken.add(k); return k; });
}

/** Pseudo-first-order wording for half-lives of effective barriers and bimolecular steps. */
export const HALF_LIFE_ORDER = 'first order, or pseudo-first order with partners at 1 mol/L';

export { rateStandardState } from '../analysis/rateStandardState.ts';

/** The forward barrier a step's k uses, J/mol: the TS raised to the higher neighbouring minimum where it lies below one. */
export function barrierUsedJ(s: Pick<KineticStep, 'barrierForwardJ' | 'reactionEnergyJ' | 'negativeBarrier'>): number | null {
  if (s.barrierForwardJ === null || s.reactionEnergyJ === null) return null;
  return s.negativeBarrier ? Math.max(s.barrierForwardJ, 0, s.reactionEnergyJ) : s.barrierForwardJ;
}

/** A pathway's overall reaction energy, J/mol: its last known point minus its first. */
export function overallReactionJ(points: readonly { energyJ: number | null }[]): number | null {
  const known = points.filter((p) => p.energyJ !== null);
  return known.length > 1 ? known.at(-1)!.energyJ! - known[0]!.energyJ! : null;
}

/** Builds the analysis report, energies in the document's display unit, rates in SI. */
export function analysisReport(doc: Document, analysis: DocumentAnalysis): AnalysisReport {
  const { profile } = analysis;
  const unit = profile.unit;
  const e = (j: number) => fromJoulesPerMol(j, unit);
  const en = (j: number | null) => (j === null ? null : e(j));
  const nameOf = (id: string) => profile.pathways.find((p) => p.id === id)?.name ?? id;
  return {
    title: doc.title,
    quantity: profile.quantity,
    unit,
    temperatureK: profile.temperatureK,
    reference: profile.reference ?? { kind: doc.settings.reference.kind, text: '' },
    standardState: rateStandardState(doc),
    pathways: analysis.pathways.map(({ pathway, steps, effectiveBarrier: eb, feasibility, energeticSpan: span }) => {
      const control: Record<string, number> = {};
      if (span) {
        const states = [...span.transitionStates, ...span.intermediates];
        controlKeys(span).forEach((k, j) => { control[k] = states[j]!.xTof; });
      }
      return {
        name: pathway.name,
        cycle: pathway.cycle,
        points: pathway.points.map((p) => ({ label: p.label, kind: p.kind, energy: en(p.energyJ), provenance: p.provenance })),
        steps: steps.map((s) => ({
          from: s.from.label, ts: s.ts?.label ?? null, to: s.to.label,
          barrierForward: en(s.barrierForwardJ), barrierReverse: en(s.barrierReverseJ), reactionEnergy: en(s.reactionEnergyJ),
          kForward: s.kForward, kReverse: s.kReverse, kForwardUnit: s.unitForward, kReverseUnit: s.unitReverse,
          equilibriumConstant: s.equilibriumConstant, halfLifeSeconds: s.halfLifeSeconds, barrierless: s.barrierless, negativeBarrier: s.negativeBarrier,
          barrierUsed: en(barrierUsedJ(s)),
        })),
        effectiveBarrier: eb && {
          value: e(eb.barrierJ), ts: eb.ts.label, intermediate: eb.intermediate.label, halfLifeSeconds: feasibility?.halfLifeSeconds ?? null, reading: feasibility ? `${feasibility.band} (${feasibility.basis})` : null,
          tsRaised: eb.tsRaised, noBarrier: eb.barrierJ <= 0, halfLifeOrder: HALF_LIFE_ORDER,
        },
        scale: pathway.scaleKey ?? '',
        reactionEnergy: en(overallReactionJ(pathway.points)),
        energeticSpan: span && {
          deltaE: e(span.deltaEJ), tdts: span.tdts.label, tdi: span.tdi.label, tof: span.tof, tofApprox: span.tofApprox,
          apparentBarrier: en(span.apparentBarrierJ), reactionEnergy: e(span.reactionEnergyJ), degreeOfTofControl: control, convention: span.convention,
        },
      };
    }),
    comparisons: analysis.comparisons.map((c): ReportComparison => c.type === 'rate'
      ? { type: 'rate', baseline: nameOf(c.baseline), candidate: nameOf(c.candidate), ddG: en(c.result?.ddgJ ?? null), rateRatio: c.result?.rateRatio ?? null, log10RateRatio: c.result?.log10RateRatio ?? null }
      : {
        type: 'selectivity', pathways: c.pathways.map(nameOf), assumption: c.result?.assumption ?? null,
        products: (c.result?.channels ?? []).map((ch) => ({ pathway: ch.label, percent: ch.percent, effectiveTs: e(ch.effectiveTsJ) })),
        ratio: c.result?.pair?.ratio ?? null, ddG: en(c.result?.pair?.ddgJ ?? null), er: c.result?.pair?.er ?? null, ee: c.enantiomeric ? c.result?.pair?.ee ?? null : null,
        ratioOf: c.result?.pair ? [nameOf(c.result.pair.of[0]), nameOf(c.result.pair.of[1])] : null,
        major: c.result?.pair ? nameOf(c.result.pair.major) : null, minor: c.result?.pair ? nameOf(c.result.pair.minor) : null,
      }),
    checks: analysis.findings,
  };
}
