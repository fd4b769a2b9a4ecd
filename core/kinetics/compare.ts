import type { Finding, ResolvedPathway } from '../profile/types.ts';
import { rtJoules } from '../units/index.ts';
import { checkConditions } from './conditions.ts';
import { effectiveBarrier, type EffectiveBarrier } from './effectiveBarrier.ts';
import { tsTopEnergies } from './tsTopEnergies.ts';
import { productDistribution, type ChannelShare, type PairSelectivity, type SelectivityChannel } from './productDistribution.ts';

/** Catalysed-vs-uncatalysed style comparison of two pathways' effective barriers. */
export interface BarrierComparison {
  baseline: EffectiveBarrier;
  candidate: EffectiveBarrier;
  /** ΔΔG‡ = baseline − candidate, J/mol (positive: the candidate is faster). */
  ddgJ: number;
  /** k_candidate / k_baseline = exp(ΔΔG‡/RT). */
  rateRatio: number;
  /** log₁₀ of the rate ratio, finite where the ratio overflows. */
  log10RateRatio: number;
}

/**
 * Rate enhancement of `candidate` over `baseline` from their effective barriers (Eyring:
 * the κ k_BT/h prefactors cancel), exp(ΔΔG‡/RT).
 */
export function compareBarriers(baseline: ResolvedPathway, candidate: ResolvedPathway, temperatureK: number): { comparison: BarrierComparison | null; findings: Finding[] } {
  const findings = checkConditions({ temperatureK });
  if (findings.length > 0) return { comparison: null, findings };
  const a = effectiveBarrier(baseline);
  const b = effectiveBarrier(candidate);
  findings.push(...a.findings, ...b.findings);
  if (a.result === null || b.result === null) return { comparison: null, findings };
  const ddgJ = a.result.barrierJ - b.result.barrierJ;
  const lnRatio = ddgJ / rtJoules(temperatureK);
  return { comparison: { baseline: a.result, candidate: b.result, ddgJ, rateRatio: Math.exp(lnRatio), log10RateRatio: lnRatio / Math.LN10 }, findings };
}

/** Curtin–Hammett selectivity between pathways that leave a common state. */
export interface CompetingPathways {
  assumption: string;
  channels: ChannelShare[];
  pair: PairSelectivity | null;
}

/** The assumption behind `competingPathways`, for display beside its numbers. */
export const CURTIN_HAMMETT_ASSUMPTION = 'Curtin–Hammett control: the states before the selectivity-deciding TSs interconvert faster than they react, so only the TS energies on the common reference decide the product ratio';

/**
 * Product distribution between pathways resolved on a common reference. Each pathway
 * contributes its highest TS, or, when `tsIds[pathway.id]` names several of its TSs, their
 * Boltzmann sum. Pathways whose energies do not share one zero (different `scaleKey`) are
 * refused with a finding. A TS below a neighbouring minimum counts at that minimum (`tsTopEnergies`,
 * the rule the step rates use). A pathway with no usable TS gives a finding and is left out.
 */
export function competingPathways(pathways: readonly ResolvedPathway[], temperatureK: number, tsIds: Readonly<Record<string, readonly string[]>> = {}): { result: CompetingPathways | null; findings: Finding[] } {
  const findings = checkConditions({ temperatureK });
  if (findings.length > 0) return { result: null, findings };
  const scales = new Set(pathways.map((p) => p.scaleKey).filter((k) => k !== undefined));
  if (scales.size > 1) {
    const names = pathways.map((p) => `"${p.name}"`).join(', ');
    return { result: null, findings: [{ severity: 'error', code: 'no-common-scale', pathway: pathways[0]?.id, message: `no selectivity between ${names}: their energies are not measured from one zero (each pathway from its own first point, or on different scales), so their TS energies cannot be compared; use the document-wide zero, a shared reference point or species sum, or let one pathway branch from a point of the other` }] };
  }
  const channels: SelectivityChannel[] = [];
  for (const p of pathways) {
    const chosen = tsIds[p.id];
    const tops = tsTopEnergies(p.points);
    const candidates = p.points.map((q, i) => ({ ...q, energyJ: tops[i] ?? null })).filter((q) => q.kind === 'ts' && (chosen === undefined || chosen.includes(q.id)));
    for (const id of chosen ?? []) {
      if (!candidates.some((q) => q.id === id)) findings.push({ severity: 'error', code: 'unknown-ts', message: `pathway "${p.name}" has no TS with id "${id}"`, pathway: p.id, point: id });
    }
    const unknown = candidates.find((q) => q.energyJ === null);
    if (unknown) findings.push({ severity: 'warning', code: 'energy-missing', message: `pathway "${p.name}" is left out of the selectivity: the energy of TS "${unknown.label}" is unknown`, pathway: p.id, point: unknown.id });
    else if (candidates.length === 0) findings.push({ severity: 'warning', code: 'no-ts', message: `pathway "${p.name}" has no TS and is left out of the selectivity`, pathway: p.id });
    else {
      const energies = candidates.map((q) => q.energyJ as number);
      channels.push({ id: p.id, label: p.name, tsEnergiesJ: chosen === undefined ? [energies.reduce((x, y) => Math.max(x, y))] : energies });
    }
  }
  if (channels.length === 0) return { result: null, findings };
  return { result: { assumption: CURTIN_HAMMETT_ASSUMPTION, ...productDistribution(channels, temperatureK) }, findings };
}
