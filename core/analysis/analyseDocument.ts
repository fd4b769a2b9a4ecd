import type { Comparison, Document } from '../model/schema.ts';
import { resolveProfile } from '../profile/resolve.ts';
import type { Finding, ResolvedPathway, ResolvedProfile } from '../profile/types.ts';
import { analyseSteps, type KineticStep } from '../kinetics/stepKinetics.ts';
import { effectiveBarrier, type EffectiveBarrier } from '../kinetics/effectiveBarrier.ts';
import { feasibilityReading, type FeasibilityReading } from '../kinetics/feasibilityReading.ts';
import { energeticSpan, type EnergeticSpan } from '../kinetics/energeticSpan.ts';
import { compareBarriers, competingPathways, type BarrierComparison, type CompetingPathways } from '../kinetics/compare.ts';
import { molecularityFromCompositions } from './molecularity.ts';
import { formatScientific } from '../format/formatScientific.ts';
import { rateStandardStateShort } from './rateStandardState.ts';
import type { StructureTable } from '../structure/readStructures.ts';
import { structureFindings } from '../structure/structureFindings.ts';
import { withStructureFormulas } from '../structure/withStructureFormulas.ts';

/** Kinetic reading of one pathway. */
export interface PathwayAnalysis {
  pathway: ResolvedPathway;
  steps: KineticStep[];
  effectiveBarrier: EffectiveBarrier | null;
  /** Common-practice reading of the effective barrier (half-life band). */
  feasibility: FeasibilityReading | null;
  /** Energetic span model, for catalytic cycles only. */
  energeticSpan: EnergeticSpan | null;
}

export type ComparisonAnalysis =
  | { type: 'rate'; baseline: string; candidate: string; result: BarrierComparison | null }
  | { type: 'selectivity'; pathways: string[]; enantiomeric: boolean; result: CompetingPathways | null };

/** Everything Passline computes from a document, energies in J/mol. */
export interface DocumentAnalysis {
  profile: ResolvedProfile;
  pathways: PathwayAnalysis[];
  comparisons: ComparisonAnalysis[];
  /** Resolution findings first, then analysis findings not already reported for the same point. */
  findings: Finding[];
}

function mergeFindings(base: Finding[], extra: Finding[]): Finding[] {
  const key = (f: Finding) => `${f.code}|${f.pathway ?? ''}|${f.point ?? ''}`;
  const seen = new Set(base.map(key));
  const merged = [...base];
  for (const f of extra) if (!seen.has(key(f))) { seen.add(key(f)); merged.push(f); }
  return merged;
}

function compare(c: Comparison, profile: ResolvedProfile, findings: Finding[]): ComparisonAnalysis {
  const byId = (id: string) => profile.pathways.find((p) => p.id === id)!;
  const t = profile.temperatureK;
  if (c.type === 'rate') {
    const { comparison, findings: f } = compareBarriers(byId(c.baseline), byId(c.candidate), t);
    findings.push(...f);
    return { type: 'rate', baseline: c.baseline, candidate: c.candidate, result: comparison };
  }
  const { result, findings: f } = competingPathways(c.pathways.map(byId), t);
  findings.push(...f);
  return { type: 'selectivity', pathways: c.pathways, enantiomeric: c.enantiomeric, result };
}

/**
 * Bimolecular rate constants above ~10¹⁰ L mol⁻¹ s⁻¹ exceed diffusion control in common
 * solvents (common practice, REFERENCE.md §10). Encounter control is a two-body idea, so only
 * bimolecular steps are checked; a termolecular k (M⁻² s⁻¹) has no comparable limit.
 */
const DIFFUSION_LIMIT = 1e10;

function fasterThanDiffusion({ pathway, steps }: PathwayAnalysis, standardState: string): Finding[] {
  const out: Finding[] = [];
  const check = (s: KineticStep, k: number | null, m: number, unit: string, dir: string) => {
    if (k !== null && m === 2 && k > DIFFUSION_LIMIT) {
      out.push({ severity: 'info', code: 'faster-than-diffusion', pathway: pathway.id, point: (s.ts ?? s.to).id, message: `the ${dir} rate constant of ${s.from.label} → ${s.to.label} is ${formatScientific(k)} ${unit} (${standardState}), above the diffusion limit (~10¹⁰ M⁻¹ s⁻¹ at c° = 1 mol/L, common practice); the step is diffusion-controlled in practice` });
    }
  };
  // Called once per Monte Carlo sample (core/uncertainty): no arrays built per step.
  for (const s of steps) {
    check(s, s.kForward, s.molecularityForward, s.unitForward, 'forward');
    check(s, s.kReverse, s.molecularityReverse, s.unitReverse, 'reverse');
  }
  return out;
}

/**
 * Resolves a document and analyses every pathway: steps with Eyring rates (molecularity
 * from compositions where known), the effective barrier, the energetic span of cycles, and
 * the comparisons the document asks for. With `structures` (read by the structure toolkit),
 * species formulas and charges come from their structures and structure findings lead.
 */
export function analyseDocument(input: Document, structures?: StructureTable | null): DocumentAnalysis {
  const doc = structures ? withStructureFormulas(input, structures) : input;
  const resolved = resolveProfile(doc);
  const profile = structures ? { ...resolved, findings: [...structureFindings(input, structures), ...resolved.findings] } : resolved;
  return analyseResolved(doc, profile);
}

/**
 * The analysis half of `analyseDocument`, for a profile already resolved from `doc` (inputs
 * marked unresolved by the editor; the uncertainty sampler resolves linear inputs once and
 * re-runs only this per sample).
 */
export function analyseResolved(doc: Document, profile: ResolvedProfile): DocumentAnalysis {
  const extra: Finding[] = [];
  const options = { temperatureK: profile.temperatureK, transmission: doc.settings.transmission, unit: doc.settings.unit };
  const pathways = profile.pathways.map((pathway, i): PathwayAnalysis => {
    const steps = analyseSteps(pathway, { ...options, molecularity: molecularityFromCompositions(doc.pathways[i]!) });
    const effective = effectiveBarrier(pathway);
    const span = pathway.cycle ? energeticSpan(pathway, options) : { span: null, findings: [] };
    extra.push(...steps.findings, ...effective.findings, ...span.findings);
    return {
      pathway,
      steps: steps.steps,
      effectiveBarrier: effective.result,
      feasibility: effective.result && profile.quantity === 'G' ? feasibilityReading(effective.result.barrierJ, profile.temperatureK) : null,
      energeticSpan: span.span,
    };
  });
  const standardState = rateStandardStateShort(doc);
  for (const p of pathways) extra.push(...fasterThanDiffusion(p, standardState));
  if (profile.quantity !== 'G') {
    extra.push({ severity: 'warning', code: 'rates-need-g', message: `rate constants, half-lives and TOFs follow from Gibbs energies; this profile is in ${profile.quantity}, so they treat Δ‡${profile.quantity} as if it were Δ‡G` });
  }
  const comparisons = doc.comparisons.map((c) => compare(c, profile, extra));
  return { profile, pathways, comparisons, findings: mergeFindings(profile.findings, extra) };
}
