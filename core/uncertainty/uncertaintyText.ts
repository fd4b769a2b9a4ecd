import { unitLabel } from '../units/energy.ts';
import type { UncertainReport } from './annotateReport.ts';
import { sigmaUnitLabel } from './uncertainInputs.ts';
import { intervalOf, probabilitiesOf, type Holder } from './reportReaders.ts';

const sci = (x: number) => x.toPrecision(3);
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
  const lines = ['', `Uncertainty: ${u.method}; N = ${u.samples} samples, seed ${u.seed}; ${u.interval}`];
  if (u.inputs.length === 0) {
    lines.push('  no input carries a σ: give "sigma" beside an entered value, or a default σ in settings.uncertainty.defaultSigma');
    return `${lines.join('\n')}\n`;
  }
  lines.push(`  inputs (σ as entered): ${u.inputs.map((i) => `${i.input} ${i.sigma} ${sigmaUnitLabel(i.unit)}${i.default ? ' (default)' : ''}`).join('; ')}`);
  for (const p of report.pathways) {
    lines.push(`  ${p.name}`);
    lines.push(`    energies / ${unit}: ${p.points.map((q) => `${q.label} ${interval(q as Holder, 'energy', e)}`).join('; ')}`);
    for (const s of p.steps) {
      lines.push(`    step ${s.from} → ${s.ts ? `${s.ts} → ` : ''}${s.to}: ΔG‡ ${interval(s as Holder, 'barrierForward', e)} ${unit}, k ${interval(s as Holder, 'kForward', sci)} ${s.kForwardUnit}`);
    }
    if (p.effectiveBarrier) lines.push(`    effective barrier ${interval(p.effectiveBarrier as Holder, 'value', e)} ${unit}`);
    const span = p.energeticSpan as Holder | null;
    if (span) {
      lines.push(`    energetic span δE ${interval(span, 'deltaE', e)} ${unit}; TOF ${interval(span, 'tof', sci)} s⁻¹`);
      lines.push(`    P(TDTS): ${probabilities(span, 'tdts')}; P(TDI): ${probabilities(span, 'tdi')}`);
    }
  }
  for (const c of report.comparisons) {
    const h = c as Holder;
    if (c.type === 'rate') lines.push(`  ${c.candidate} vs ${c.baseline}: ΔΔG‡ ${interval(h, 'ddG', e)} ${unit}, rate ratio ${interval(h, 'rateRatio', sci)}; P(faster): ${probabilities(h, 'faster')}`);
    else {
      const shares = c.products.map((x) => `${x.pathway} ${interval(x as Holder, 'percent', (v) => v.toFixed(1))} %`).join(', ');
      lines.push(`  selectivity: ${shares}${c.ee === null ? '' : `; ee ${interval(h, 'ee', (v) => (100 * v).toFixed(1))} %`}; P(major): ${probabilities(h, 'major')}`);
    }
  }
  for (const s of u.rateSensitivity) {
    const top = s.shares.filter((x) => x.share >= 0.01).slice(0, 5);
    if (top.length > 0) lines.push(`  what matters for ${s.target} of ${s.pathway} (variance shares): ${top.map((x) => `${x.input} ${percent(x.share)}`).join(', ')}`);
  }
  return `${lines.join('\n')}\n`;
}
