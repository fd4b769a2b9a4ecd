import { makeDocument } from '../../../core/model/load.ts';
import type { DocumentInput } from '../../../core/model/schema.ts';
import { convertEnergy } from '../../../core/units/energy.ts';

type PointInput = NonNullable<DocumentInput['pathways']>[number]['points'][number];
type SpeciesInput = NonNullable<DocumentInput['species']>[number];

/** kcal/mol -> hartree, for building species energies from readable numbers. */
export const kcalToHartree = (kcal: number) => convertEnergy(kcal, 'kcal/mol', 'hartree');

/** A point with a typed value in kcal/mol. */
export function typed(id: string, kind: 'min' | 'ts', kcal: number, extra: Partial<PointInput> = {}): PointInput {
  return { id, label: id, kind, energy: { mode: 'value', value: kcal, unit: 'kcal/mol' }, ...extra };
}

/** A point given as a sum of species. */
export function state(id: string, kind: 'min' | 'ts', terms: [string, number][]): PointInput {
  return { id, label: id, kind, energy: { mode: 'species', terms: terms.map(([species, count]) => ({ species, count })) } };
}

/** A species with one structure: G = electronic (kcal/mol) + gCorrection, all as hartree. */
export function species(id: string, kcal: number, extra: Partial<SpeciesInput> = {}): SpeciesInput {
  return { id, label: id, structures: [{ electronic: kcalToHartree(kcal), hCorrection: 0, gCorrection: 0 }], ...extra };
}

/** A one-pathway document. */
export function onePathway(points: PointInput[], rest: Omit<DocumentInput, 'format' | 'version' | 'pathways'> = {}, cycle = false) {
  return makeDocument({ ...rest, pathways: [{ id: 'a', name: 'A', cycle, points }] });
}
