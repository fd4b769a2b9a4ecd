import type { ResolvedProfile } from '../../core/profile/types.ts';
import type { Unit } from '../../core/model/schema.ts';
import { unitLabel } from '../../core/units/energy.ts';
import { formatEnergy, formatSignedEnergy, KIND_NAMES } from '../format/formatEnergy.ts';
import type { UncertaintyResult } from '../../core/uncertainty/uncertaintyRun.ts';
import { intervalNote, runNote } from './intervalNote.ts';

/** What hovering a level tells: name and kind, energy with unit, where it came from, the way to the next point. */
export interface PointSummary {
  title: string;
  energy: string;
  provenance: string;
  next: string | null;
  /** The energy's 95 % interval with N and seed, when a finished Monte Carlo run reaches it. */
  interval: string | null;
}

/** Summary of one point for the canvas tooltip and the level's accessible name. */
export function pointSummary(profile: ResolvedProfile, pathwayId: string, pointId: string, unit: Unit, decimals: number, run?: UncertaintyResult): PointSummary | null {
  const pathway = profile.pathways.find((p) => p.id === pathwayId);
  const index = pathway?.points.findIndex((p) => p.id === pointId) ?? -1;
  if (!pathway || index < 0) return null;
  const point = pathway.points[index]!;
  const after = pathway.points[index + 1];
  const u = unitLabel(unit);
  const signed = (j: number) => formatSignedEnergy(j, unit, decimals);
  let next: string | null = null;
  if (after && point.energyJ !== null && after.energyJ !== null) {
    const gap = after.energyJ - point.energyJ;
    next = after.kind === 'ts' && point.kind === 'min'
      ? `barrier to ${after.label}: ${signed(gap)} ${u}`
      : `to ${after.label}: ${signed(gap)} ${u}`;
  }
  return {
    title: `${point.label.trim() || `unlabelled point ${index + 1}`} (${KIND_NAMES[point.kind]}, ${pathway.name})`,
    energy: point.energyJ === null ? 'no energy' : `${profile.quantity === 'E' ? 'ΔE' : `Δ${profile.quantity}`} = ${formatEnergy(point.energyJ, unit, decimals)} ${u}`,
    provenance: point.provenance.detail,
    next,
    interval: ((note) => (note ? `${note} (${runNote(run)})` : null))(intervalNote(run, `${pathwayId}/${pointId}/energy`, unit, decimals)),
  };
}
