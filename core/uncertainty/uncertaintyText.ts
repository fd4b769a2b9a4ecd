import { unitLabel } from '../units/energy.ts';
import type { UncertainReport } from './annotateReport.ts';
import { uncertaintyStatement } from './uncertaintyStatement.ts';
import { entryIntervalOf, intervalOf, probabilitiesOf, type Holder } from './reportReaders.ts';

const sci = (x: number) => x.toPrecision(3);
const SYMBOL = { E: 'ΔE', H: 'ΔH', G: 'ΔG' } as const;
const percent = (p: number) => `${(100 * p).toFixed(1)} %`;

function interval(holder: Holder | null | undefined, field: string, show: (x: number) => string): string {
  const i = intervalOf(holder, field);
  return i ? `${show(i.median)} [${show(i.low)}, ${show(i.high)}]` : '—';
}

function probabilities(holder: Holder | null | undefined, field: string): string {
  const p = probabilitiesOf(holder, field);
  return p.length === 0 ? '—' : p.map(([k, v]) => `${k} ${percent(v)}`).join(', ');
}

/**
 * Plain-text section for `analyze --uncertainty`: N, seed and every input σ first, then the
 * median [95 % interval] of the points, steps, effective barriers, spans, comparisons, and
 * which inputs matter most for the rate.
 */
export function uncertaintyText(report: UncertainReport, decimals = 1): string {
  const u = report.uncertainty;
  const unit = unitLabel(report.unit);
  const e = (x: number) => x.toFixed(decimals);
  const d = SYMBOL[report.quantity];
  const stated = uncertaintyStatement(u);
  const lines = ['', `Uncertainty: ${stated.run}`];
  if (u.inputs.length === 0) {
    lines.push(`  ${stated.inputs}`);
    return `${lines.join('\n')}\n`;
  }
  lines.push(`  inputs (σ as entered): ${stated.inputs}`);
  for (const p of report.pathways) {
    lines.push(`  ${p.name}`);
    lines.push(`    energies / ${unit}: ${p.points.map((q) => `${q.label} ${interval(q as Holder, 'energy', e)}`).join('; ')}`);
    if (p.reactionEnergy !== null) lines.push(`    overall ${d} ${interval(p as Holder, 'reactionEnergy', e)} ${unit}`);
    for (const s of p.steps) {
      const h = s as Holder;
      const used = s.negativeBarrier ? ` (k uses ${interval(h, 'barrierUsed', e)})` : '';
      lines.push(`    step ${s.from} → ${s.ts ? `${s.ts} → ` : ''}${s.to}: ${d}‡ ${interval(h, 'barrierForward', e)} / ${interval(h, 'barrierReverse', e)} back${used}, Δ ${interval(h, 'reactionEnergy', e)} ${unit}; k ${interval(h, 'kForward', sci)} ${s.kForwardUnit}, k₋ ${interval(h, 'kReverse', sci)} ${s.kReverseUnit}; K ${interval(h, 'equilibriumConstant', sci)}; t½ ${interval(h, 'halfLifeSeconds', sci)} s`);
    }
    const eb = p.effectiveBarrier as (Holder & { halfLifeSeconds: number | null }) | null;
    if (eb) lines.push(`    effective barrier ${interval(eb, 'value', e)} ${unit}${eb.halfLifeSeconds === null ? '' : `, t½ ${interval(eb, 'halfLifeSeconds', sci)} s`}`);
    const span = p.energeticSpan as Holder | null;
    if (span) {
      lines.push(`    energetic span δE ${interval(span, 'deltaE', e)} ${unit}; TOF ${interval(span, 'tof', sci)} s⁻¹ (δE approximation ${interval(span, 'tofApprox', sci)} s⁻¹); apparent barrier ${interval(span, 'apparentBarrier', e)} ${unit}; ${d}r per turnover ${interval(span, 'reactionEnergy', e)} ${unit}`);
      lines.push(`    P(TDTS): ${probabilities(span, 'tdts')}; P(TDI): ${probabilities(span, 'tdi')}`);
      const control = Object.entries(p.energeticSpan!.degreeOfTofControl).filter(([, x]) => x >= 0.01);
      const xTof = (k: string) => { const i = entryIntervalOf(span, 'degreeOfTofControl', k); return i ? `${i.median.toFixed(2)} [${i.low.toFixed(2)}, ${i.high.toFixed(2)}]` : '—'; };
      if (control.length > 0) lines.push(`    degree of TOF control: ${control.map(([k]) => `${k} ${xTof(k)}`).join(', ')}`);
    }
  }
  for (const c of report.comparisons) {
    const h = c as Holder;
    if (c.type === 'rate') lines.push(`  ${c.candidate} vs ${c.baseline}: Δ${d}‡ ${interval(h, 'ddG', e)} ${unit}, rate ratio ${interval(h, 'rateRatio', sci)}; P(faster): ${probabilities(h, 'faster')}`);
    else {
      const shares = c.products.map((x) => `${x.pathway} ${interval(x as Holder, 'percent', (v) => v.toFixed(1))} % (effective TS ${interval(x as Holder, 'effectiveTs', e)} ${unit})`).join(', ');
      const pair = c.ratioOf && c.ratio !== null ? `; ${c.ratioOf[0]} : ${c.ratioOf[1]} = ${interval(h, 'ratio', sci)}, Δ${d}‡ ${interval(h, 'ddG', e)} ${unit}` : '';
      lines.push(`  selectivity: ${shares}${pair}${c.ee === null ? '' : `; ee toward ${c.major} ${interval(h, 'ee', (v) => (100 * v).toFixed(1))} %`}; P(major): ${probabilities(h, 'major')}`);
    }
  }
  for (const s of u.rateSensitivity) {
    const top = s.shares.filter((x) => x.share >= 0.01).slice(0, 5);
    if (top.length > 0) lines.push(`  what matters for ${s.target} of ${s.pathway} (variance shares): ${top.map((x) => `${x.input} ${percent(x.share)}`).join(', ')}`);
  }
  return `${lines.join('\n')}\n`;
}
