import { unitLabel } from '../units/energy.ts';
import { HALF_LIFE_ORDER, type AnalysisReport } from './analysisReport.ts';

const QUANTITY_SYMBOL = { E: 'ΔE', H: 'ΔH', G: 'ΔG' } as const;

/** Formats an energy with a sign and fixed decimals; "—" when unknown. */
export function formatEnergy(value: number | null, decimals: number): string {
  if (value === null) return '—';
  const fixed = value.toFixed(decimals);
  return value > 0 && Number(fixed) !== 0 ? `+${fixed}` : fixed.replace(/^-(0\.?0*)$/, '$1');
}

function sci(value: number | null): string {
  return value === null ? '—' : value.toPrecision(3);
}

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

/** Plain-text rendering of an analysis report for the terminal. */
export function analysisText(report: AnalysisReport, decimals = 1): string {
  const lines: string[] = [];
  const unit = unitLabel(report.unit);
  const barrier = `${QUANTITY_SYMBOL[report.quantity]}‡`;
  lines.push(`${report.title || 'Untitled'} — ${QUANTITY_SYMBOL[report.quantity]} / ${unit} at ${report.temperatureK} K`);
  if (report.reference.text) lines.push(`reference: ${report.reference.text}`);
  lines.push(`k and K: ${report.standardState}`);
  if (report.quantity !== 'G') lines.push(`rates below are estimates: Eyring k, t½ and TOF need Gibbs energies, and this profile is in ${report.quantity} (${barrier} used in place of ΔG‡)`);
  for (const pathway of report.pathways) {
    lines.push('', `${pathway.name}${pathway.cycle ? ' (catalytic cycle)' : ''}`);
    const width = Math.max(5, ...pathway.points.map((p) => p.label.length)) + 2;
    for (const p of pathway.points) {
      lines.push(`  ${pad(p.label, width)}${pad(p.kind === 'ts' ? 'TS' : 'min', 5)}${pad(formatEnergy(p.energy, decimals), 10)}${unit}   ${p.provenance.detail}`);
    }
    for (const s of pathway.steps) {
      const name = `${s.from} → ${s.ts ? `${s.ts} → ` : ''}${s.to}`;
      const raised = s.negativeBarrier ? ` (k uses ${formatEnergy(s.barrierUsed, decimals)}: TS raised to the higher minimum; drawn ${formatEnergy(s.barrierForward, decimals)} / ${formatEnergy(s.barrierReverse, decimals)})` : '';
      const shown = s.negativeBarrier ? `${formatEnergy(s.barrierUsed, decimals)}*` : `${formatEnergy(s.barrierForward, decimals)} / ${formatEnergy(s.barrierReverse, decimals)} back`;
      lines.push(`  step ${name}: ${barrier} ${shown}, Δ ${formatEnergy(s.reactionEnergy, decimals)} ${unit}; k ${sci(s.kForward)} ${s.kForwardUnit}, k₋ ${sci(s.kReverse)} ${s.kReverseUnit}${s.barrierless ? ' (barrierless)' : ''}${raised}`);
    }
    const eb = pathway.effectiveBarrier;
    if (eb?.noBarrier) lines.push('  no barrier: nothing on this pathway rises above an earlier minimum');
    else if (eb) lines.push(`  effective barrier ${formatEnergy(eb.value, decimals)} ${unit} (${eb.intermediate} → ${eb.ts}${eb.tsRaised ? ', TS raised to a neighbouring minimum' : ''})${eb.halfLifeSeconds === null ? '' : `, t½ ${sci(eb.halfLifeSeconds)} s (${HALF_LIFE_ORDER}): ${eb.reading?.split(' (')[0]} (common practice)`}`);
    const span = pathway.energeticSpan;
    if (span) {
      lines.push(`  energetic span δE ${formatEnergy(span.deltaE, decimals)} ${unit}: TDTS ${span.tdts}, TDI ${span.tdi}; TOF ${sci(span.tof)} s⁻¹ (δE approximation ${sci(span.tofApprox)} s⁻¹)`);
      lines.push(`  degree of TOF control: ${Object.entries(span.degreeOfTofControl).filter(([, x]) => x >= 0.01).map(([k, x]) => `${k} ${x.toFixed(2)}`).join(', ')}`);
    }
  }
  for (const c of report.comparisons) {
    if (c.type === 'rate') lines.push('', `${c.candidate} vs ${c.baseline}: ΔΔG‡ ${formatEnergy(c.ddG, decimals)} ${unit}, rate ratio ${sci(c.rateRatio)}`);
    else {
      const pair = c.ratioOf && c.ratio !== null ? `; ${c.ratioOf[0]} : ${c.ratioOf[1]} = ${sci(c.ratio)}, ΔΔG‡ ${formatEnergy(c.ddG, decimals)} ${unit} (the two major products)` : '';
      lines.push('', `selectivity (${c.assumption === null ? 'not available' : 'Curtin–Hammett'}): ${c.products.map((p) => `${p.pathway} ${p.percent.toFixed(1)}%`).join(', ')}${pair}${c.ee === null ? '' : `, ee ${(100 * c.ee).toFixed(1)}%`}`);
    }
  }
  if (report.checks.length > 0) {
    lines.push('', 'Findings');
    for (const f of report.checks) lines.push(`  ${f.severity}: [${f.code}] ${f.message}${f.pathway ? ` (${f.pathway}${f.point ? ` / ${f.point}` : ''})` : ''}`);
  }
  return `${lines.join('\n')}\n`;
}
