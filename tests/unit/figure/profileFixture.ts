import { makeDocument } from '../../../core/model/load.ts';
import type { Document, DocumentInput, Unit } from '../../../core/model/schema.ts';
import type { ResolvedProfile } from '../../../core/profile/types.ts';
import { toJoulesPerMol } from '../../../core/units/energy.ts';

/** [label, kind, energy in the fixture unit or null] */
export type PointSpec = [string, 'min' | 'ts', number | null];

export interface PathwaySpec {
  id: string;
  name: string;
  points: PointSpec[];
}

/**
 * A document and the ResolvedProfile it stands for, built directly (typed values, so the
 * resolved energy is the typed one converted to J/mol). `figure` overrides figure settings.
 */
export function fixture(pathways: PathwaySpec[], figure: DocumentInput['figure'] = {}, unit: Unit = 'kcal/mol', decimals = 1): { doc: Document; profile: ResolvedProfile } {
  const doc = makeDocument({
    settings: { unit, decimals },
    figure,
    pathways: pathways.map((p) => ({
      id: p.id, name: p.name,
      points: p.points.map(([label, kind, e], i) => ({ id: `${p.id}-${i}`, label, kind, energy: { mode: 'value', value: e ?? 0, unit } })),
    })),
  });
  const profile: ResolvedProfile = {
    quantity: doc.settings.quantity, unit, temperatureK: doc.settings.temperatureK, findings: [],
    pathways: pathways.map((p) => ({
      id: p.id, name: p.name, cycle: false,
      points: p.points.map(([label, kind, e], i) => ({
        id: `${p.id}-${i}`, label, kind, energyJ: e === null ? null : toJoulesPerMol(e, unit),
        provenance: { route: e === null ? 'missing' : 'typed', detail: 'fixture', approximations: [] },
      })),
    })),
  };
  return { doc, profile };
}

/** An invented two-pathway scenario (our own numbers): catalysed vs uncatalysed. */
export function twoPathways(figure: DocumentInput['figure'] = {}) {
  return fixture([
    { id: 'cat', name: 'with catalyst', points: [['A + B', 'min', 0], ['TS1', 'ts', 14.2], ['Int1', 'min', -3.5], ['TS2', 'ts', 9.8], ['P', 'min', -12.4]] },
    { id: 'un', name: 'uncatalysed', points: [['A + B', 'min', 0], ['TS', 'ts', 27.6], ['P', 'min', -12.4]] },
  ], figure);
}
