import type { AnalysisReport } from '../../core/report/analysisReport.ts';
import type { Table } from '../../core/export/tables.ts';
import { unitLabel } from '../../core/units/energy.ts';

/** The step analysis of every pathway as a plain table (energies in the report's unit, rates in SI). */
export function stepsTable(report: AnalysisReport): Table {
  const u = unitLabel(report.unit);
  const q = report.quantity;
  return {
    columns: ['pathway', 'from', 'TS', 'to', `Δ${q}‡ forward / ${u}`, `Δ${q}‡ reverse / ${u}`, `Δr${q} / ${u}`, 'k forward', 'k forward unit', 'k reverse', 'k reverse unit', 'K', 'half-life / s'],
    rows: report.pathways.flatMap((p) => p.steps.map((s) => [
      p.name, s.from, s.ts, s.to, s.barrierForward, s.barrierReverse, s.reactionEnergy,
      s.kForward, s.kForwardUnit, s.kReverse, s.kReverseUnit, s.equilibriumConstant, s.halfLifeSeconds,
    ])),
  };
}
