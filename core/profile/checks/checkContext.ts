import type { Document } from '../../model/schema.ts';
import { fromJoulesPerMol, unitLabel } from '../../units/energy.ts';
import type { ResolveContext } from '../context.ts';
import type { ResolvedPathway } from '../types.ts';
import { energyDecimals } from '../../format/energyDecimals.ts';

/** What every consistency check reads. */
export interface CheckInput {
  doc: Document;
  pathways: readonly ResolvedPathway[];
  ctx: ResolveContext;
}

/** An energy difference in the display unit, for messages ("2.3 kcal mol⁻¹"). */
export function showEnergy(doc: Document, joules: number): string {
  return `${fromJoulesPerMol(joules, doc.settings.unit).toFixed(Math.max(energyDecimals(doc.settings, doc.settings.unit), 1))} ${unitLabel(doc.settings.unit)}`;
}

/** Energies closer than this (J/mol) count as equal: 0.01 J/mol is far below any reported digit. */
export const EQUAL_J = 0.01;
