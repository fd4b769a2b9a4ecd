import { unitLabel } from '../units/energy.ts';
import type { AnalysisReport } from './analysisReport.ts';

const QUANTITY_SYMBOL = { E: 'ΔE', H: 'ΔH', G: 'ΔG' } as const;

/** Formats an energy with a sign and fixed decimals; "—" when unknown. */
export function formatEnergy(value: number | null, decimals: number): string {
  if (value === null) return '—';
  const fixed = value.toFixed(decimals);
  return value > 0 && Number(fixed) !== 0 ? `+${fixed}` : fixed.replace(/^-(0\.?0*)$/, '$1');
}

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

/** Plain-text rendering of an analysis report for the terminal. */
export function analysisText(report: AnalysisReport, decimals = 1): string {
  const lines: string[] = [];
  const unit = unitLabel(report.unit);
  lines.push(`${report.title || 'Untitled'} — ${QUANTITY_SYMBOL[report.quantity]} / ${unit} at ${report.temperatureK} K`);
  for (const pathway of report.pathways) {
    lines.push('', `${pathway.name}${pathway.cycle ? ' (catalytic cycle)' : ''}`);
    const width = Math.max(5, ...pathway.points.map((p) => p.label.length)) + 2;
    for (const p of pathway.points) {
      lines.push(`  ${pad(p.label, width)}${pad(p.kind === 'ts' ? 'TS' : 'min', 5)}${pad(formatEnergy(p.energy, decimals), 10)}${unit}   ${p.provenance.detail}`);
    }
  }
  if (report.checks.length > 0) {
    lines.push('', 'Findings');
    for (const f of report.checks) lines.push(`  ${f.severity}: [${f.code}] ${f.message}${f.pathway ? ` (${f.pathway}${f.point ? ` / ${f.point}` : ''})` : ''}`);
  }
  return `${lines.join('\n')}\n`;
}
