import type { DocumentAnalysis } from '../analysis/analyseDocument.ts';
import { barrierUsedJ, controlKeys, overallReactionJ } from '../report/analysisReport.ts';

/**
 * How a sampled number is stored and shown: energies in J/mol (shown in the display unit),
 * positive rates and ratios as their natural log (shown as the number; percentiles commute
 * with the monotone exp), or as they are.
 */
export type QuantityScale = 'energy' | 'log' | 'plain';

/** One derived number followed through the samples, and where it sits in the analysis report. */
export interface DerivedQuantity {
  key: string;
  /** Path of the object in `analyze --json` that holds the number, and its field name there. */
  path: (string | number)[];
  field: string;
  /** For a number inside a keyed table (a cycle's X_TOF): its key there; the interval goes under `field` → `entry`. */
  entry?: string;
  scale: QuantityScale;
  /** For a point's energy: the pathway and point ids. */
  at?: { pathway: string; point: string };
  read: (a: DocumentAnalysis) => number | null;
}

/** A categorical result: which state or pathway wins in each sample. */
export interface DerivedChoice {
  key: string;
  path: (string | number)[];
  field: string;
  read: (a: DocumentAnalysis) => string | null;
}

const logOf = (x: number | null | undefined) => (x === null || x === undefined || !(x > 0) ? null : Math.log(x));

/**
 * The numbers and choices of an analysis that the Monte Carlo summarises, read from the point
 * estimate `a0` so that every sample (same document shape) answers the same list.
 */
export function derivedQuantities(a0: DocumentAnalysis): { quantities: DerivedQuantity[]; choices: DerivedChoice[] } {
  const quantities: DerivedQuantity[] = [];
  const choices: DerivedChoice[] = [];
  const q = (key: string, path: (string | number)[], field: string, scale: QuantityScale, read: DerivedQuantity['read']) => quantities.push({ key, path, field, scale, read });
  a0.pathways.forEach((pa, pi) => {
    const id = pa.pathway.id;
    const at = (a: DocumentAnalysis) => a.pathways[pi]!;
    pa.pathway.points.forEach((p, qi) => quantities.push({ key: `${id}/${p.id}/energy`, path: ['pathways', pi, 'points', qi], field: 'energy', scale: 'energy', at: { pathway: id, point: p.id }, read: (a) => at(a).pathway.points[qi]!.energyJ }));
    pa.steps.forEach((_, si) => {
      const path = ['pathways', pi, 'steps', si];
      const s = (a: DocumentAnalysis) => at(a).steps[si]!;
      q(`${id}/step ${si}/barrierForward`, path, 'barrierForward', 'energy', (a) => s(a).barrierForwardJ);
      q(`${id}/step ${si}/barrierReverse`, path, 'barrierReverse', 'energy', (a) => s(a).barrierReverseJ);
      q(`${id}/step ${si}/reactionEnergy`, path, 'reactionEnergy', 'energy', (a) => s(a).reactionEnergyJ);
      q(`${id}/step ${si}/barrierUsed`, path, 'barrierUsed', 'energy', (a) => barrierUsedJ(s(a)));
      q(`${id}/step ${si}/kForward`, path, 'kForward', 'log', (a) => s(a).logKForward);
      q(`${id}/step ${si}/kReverse`, path, 'kReverse', 'log', (a) => s(a).logKReverse);
      q(`${id}/step ${si}/equilibriumConstant`, path, 'equilibriumConstant', 'log', (a) => s(a).logEquilibriumConstant);
      q(`${id}/step ${si}/halfLifeSeconds`, path, 'halfLifeSeconds', 'log', (a) => logOf(s(a).halfLifeSeconds));
    });
    q(`${id}/reactionEnergy`, ['pathways', pi], 'reactionEnergy', 'energy', (a) => overallReactionJ(at(a).pathway.points));
    if (pa.effectiveBarrier) {
      const path = ['pathways', pi, 'effectiveBarrier'];
      q(`${id}/effectiveBarrier`, path, 'value', 'energy', (a) => at(a).effectiveBarrier?.barrierJ ?? null);
      q(`${id}/effectiveBarrier/halfLife`, path, 'halfLifeSeconds', 'log', (a) => logOf(at(a).feasibility?.halfLifeSeconds));
    }
    const span = pa.energeticSpan;
    if (span) {
      const path = ['pathways', pi, 'energeticSpan'];
      const sp = (a: DocumentAnalysis) => at(a).energeticSpan;
      q(`${id}/span/deltaE`, path, 'deltaE', 'energy', (a) => sp(a)?.deltaEJ ?? null);
      q(`${id}/span/tof`, path, 'tof', span.tof > 0 ? 'log' : 'plain', (a) => (span.tof > 0 ? sp(a)?.logAbsTof ?? null : sp(a)?.tof ?? null));
      q(`${id}/span/tofApprox`, path, 'tofApprox', 'log', (a) => logOf(sp(a)?.tofApprox));
      q(`${id}/span/apparentBarrier`, path, 'apparentBarrier', 'energy', (a) => sp(a)?.apparentBarrierJ ?? null);
      q(`${id}/span/reactionEnergy`, path, 'reactionEnergy', 'energy', (a) => sp(a)?.reactionEnergyJ ?? null);
      const nTs = span.transitionStates.length;
      controlKeys(span).forEach((entry, j) => {
        const state = (a: DocumentAnalysis) => { const x = sp(a); return x ? (j < nTs ? x.transitionStates[j] : x.intermediates[j - nTs]) : undefined; };
        quantities.push({ key: `${id}/span/xTof/${entry}`, path, field: 'degreeOfTofControl', entry, scale: 'plain', read: (a) => state(a)?.xTof ?? null });
      });
      choices.push({ key: `${id}/span/tdts`, path, field: 'tdts', read: (a) => sp(a)?.tdts.label ?? null });
      choices.push({ key: `${id}/span/tdi`, path, field: 'tdi', read: (a) => sp(a)?.tdi.label ?? null });
    }
  });
  const nameOf = (id: string) => a0.profile.pathways.find((p) => p.id === id)?.name ?? id;
  a0.comparisons.forEach((c, ci) => {
    const path = ['comparisons', ci];
    const cmp = (a: DocumentAnalysis) => a.comparisons[ci]!;
    if (c.type === 'rate') {
      const r = (a: DocumentAnalysis) => { const x = cmp(a); return x.type === 'rate' ? x.result : null; };
      q(`comparison ${ci}/ddG`, path, 'ddG', 'energy', (a) => r(a)?.ddgJ ?? null);
      q(`comparison ${ci}/rateRatio`, path, 'rateRatio', 'log', (a) => { const x = r(a); return x ? x.log10RateRatio * Math.LN10 : null; });
      q(`comparison ${ci}/log10RateRatio`, path, 'log10RateRatio', 'plain', (a) => r(a)?.log10RateRatio ?? null);
      choices.push({ key: `comparison ${ci}/faster`, path, field: 'faster', read: (a) => { const x = r(a); return x ? nameOf(x.ddgJ > 0 ? c.candidate : c.baseline) : null; } });
    } else {
      const r = (a: DocumentAnalysis) => { const x = cmp(a); return x.type === 'selectivity' ? x.result : null; };
      c.result?.channels.forEach((ch, k) => {
        const channel = (a: DocumentAnalysis) => r(a)?.channels.find((x) => x.id === ch.id);
        q(`comparison ${ci}/${ch.id}/percent`, ['comparisons', ci, 'products', k], 'percent', 'plain', (a) => channel(a)?.percent ?? null);
        q(`comparison ${ci}/${ch.id}/effectiveTs`, ['comparisons', ci, 'products', k], 'effectiveTs', 'energy', (a) => channel(a)?.effectiveTsJ ?? null);
      });
      if (c.result?.pair) {
        q(`comparison ${ci}/ddG`, path, 'ddG', 'energy', (a) => r(a)?.pair?.ddgJ ?? null);
        q(`comparison ${ci}/ratio`, path, 'ratio', 'log', (a) => logOf(r(a)?.pair?.ratio));
        q(`comparison ${ci}/er`, path, 'er', 'log', (a) => logOf(r(a)?.pair?.er));
        // ee is unsigned (|tanh(ΔΔG‡/2RT)|): sampled unsigned, a run where the other enantiomer wins would
        // count as high ee. Signed toward the point estimate's major product, its percentiles are those of ΔΔG‡ mapped by tanh.
        const major0 = c.result.pair.major;
        if (c.enantiomeric) q(`comparison ${ci}/ee`, path, 'ee', 'plain', (a) => { const p = r(a)?.pair; return p ? (p.major === major0 ? p.ee : -p.ee) : null; });
      }
      choices.push({ key: `comparison ${ci}/major`, path, field: 'major', read: (a) => { const ch = r(a)?.channels; return ch && ch.length > 0 ? ch.reduce((x, y) => (y.fraction > x.fraction ? y : x)).label : null; } });
    }
  });
  return { quantities, choices };
}
