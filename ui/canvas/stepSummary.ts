import type { DocumentAnalysis } from '../../core/analysis/analyseDocument.ts';
import type { Unit } from '../../core/model/schema.ts';
import { unitLabel } from '../../core/units/energy.ts';
import { formatSignedEnergy } from '../format/formatEnergy.ts';
import { formatScientific } from '../format/formatNumber.ts';
import type { UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import { intervalNote, runNote } from './intervalNote.ts';

const signed = formatSignedEnergy;

/**
 * What picking a connector tells: the kinetic step it belongs to (minimum → TS → minimum,
 * or two minima in a row) with its barriers, reaction energy and forward rate constant,
 * all with units; with a finished Monte Carlo run, the 95 % intervals of the forward barrier
 * and k, with N and the seed. Null when the connector is not part of a step (e.g. an open end).
 */
export function stepSummary(analysis: DocumentAnalysis, pathwayId: string, from: string, to: string, unit: Unit, decimals: number, run?: UncertaintyResult): string | null {
  const pathway = analysis.pathways.find((p) => p.pathway.id === pathwayId);
  const step = pathway?.steps.find((s) => (s.ts
    ? (s.from.id === from && s.ts.id === to) || (s.ts.id === from && s.to.id === to)
    : s.from.id === from && s.to.id === to));
  if (!pathway || !step) return null;
  const q = analysis.profile.quantity;
  const u = unitLabel(unit);
  const route = `${step.from.label} → ${step.ts ? `${step.ts.label} → ` : ''}${step.to.label}`;
  const k = step.kForward === null ? '' : `; k forward ${formatScientific(step.kForward)} ${step.unitForward}`;
  const si = pathway.steps.indexOf(step);
  const barrier = intervalNote(run, `${pathwayId}/step ${si}/barrierForward`, unit, decimals);
  const kNote = intervalNote(run, `${pathwayId}/step ${si}/kForward`, unit, decimals, step.unitForward);
  const intervals = barrier || kNote ? `. ${[barrier && `Δ${q}‡ forward ${barrier}`, kNote && `k forward ${kNote}`].filter(Boolean).join('; ')} (${runNote(run)})` : '';
  return `Step ${route} (${pathway.pathway.name}): Δ${q}‡ ${signed(step.barrierForwardJ, unit, decimals)} ${u} forward, ${signed(step.barrierReverseJ, unit, decimals)} ${u} back; Δr${q} ${signed(step.reactionEnergyJ, unit, decimals)} ${u}${k}${intervals}`;
}
