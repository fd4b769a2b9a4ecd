import type { ResolvedProfile } from '../profile/types.ts';
import { fromJoulesPerMol, unitLabel } from '../units/energy.ts';

/** A plain table: column titles and rows of cells (null = unknown). */
export interface Table {
  columns: string[];
  rows: (string | number | null)[][];
}

export { tableToCsv } from './tableToCsv.ts';
export { tableToMarkdown } from './tableToMarkdown.ts';

/**
 * The points of every pathway with their relative energy in the profile's unit (rounded
 * to `decimals`) and where the energy came from.
 */
export function pointsTable(profile: ResolvedProfile, decimals: number): Table {
  const energy = `Δ${profile.quantity} / ${unitLabel(profile.unit)}`;
  return {
    columns: ['pathway', 'point', 'label', 'kind', energy, 'source'],
    rows: profile.pathways.flatMap((p) => p.points.map((q) => [
      p.name, q.id, q.label, q.kind === 'ts' ? 'TS' : 'minimum',
      q.energyJ === null ? null : round(fromJoulesPerMol(q.energyJ, profile.unit), decimals),
      q.provenance.detail,
    ])),
  };
}

function round(value: number, decimals: number): number {
  const r = Number(value.toFixed(decimals));
  return Object.is(r, -0) ? 0 : r;
}
