import type { Document, EnergySpec, Point, Species, Structure } from '../model/schema.ts';
import type { UncertainInput } from './uncertainInputs.ts';

function shiftPoint(point: Point, field: 'value' | 'lambda' | 'e0', delta: number): Point {
  const e = point.energy;
  let energy: EnergySpec = e;
  if (field === 'value' && (e.mode === 'value' || e.mode === 'step' || e.mode === 'barrier')) energy = { ...e, value: e.value + delta };
  else if (e.mode === 'estimate' && field === 'lambda' && e.estimate.method === 'marcus') energy = { ...e, estimate: { ...e.estimate, lambda: e.estimate.lambda + delta } };
  else if (e.mode === 'estimate' && field === 'e0' && e.estimate.method === 'bep') energy = { ...e, estimate: { ...e.estimate, e0: e.estimate.e0 + delta } };
  return { ...point, energy };
}

function shiftStructure(s: Structure, field: 'energy' | 'correction', delta: number, quantity: Document['settings']['quantity']): Structure {
  if (field === 'energy') return s.singlePoint === undefined ? { ...s, electronic: s.electronic + delta } : { ...s, singlePoint: s.singlePoint + delta };
  if (quantity === 'G' && s.gCorrection !== undefined) return { ...s, gCorrection: s.gCorrection + delta };
  if (quantity === 'H' && s.hCorrection !== undefined) return { ...s, hCorrection: s.hCorrection + delta };
  return s;
}

function shiftSpecies(species: Species, delta: number): Species {
  return { ...species, structures: species.structures.map((s) => shiftStructure(s, 'energy', delta, 'E')) };
}

/**
 * An ordinary document with `deltas[i]` (in input i's own unit) added to input i. Only the
 * objects on a changed path are copied; the original is not touched.
 */
export function perturbDocument(doc: Document, inputs: readonly UncertainInput[], deltas: ArrayLike<number>): Document {
  if (inputs.length === 0) return doc;
  const pathways = doc.pathways.slice();
  const points = new Map<number, Point[]>();
  const species = doc.species.slice();
  const pointsOf = (pi: number) => {
    let list = points.get(pi);
    if (!list) { list = pathways[pi]!.points.slice(); points.set(pi, list); }
    return list;
  };
  inputs.forEach((input, i) => {
    const d = deltas[i]!;
    const t = input.target;
    if (t.kind === 'point') {
      const list = pointsOf(t.pathway);
      list[t.point] = shiftPoint(list[t.point]!, t.field, d);
    } else if (t.kind === 'structure') {
      const s = species[t.species]!;
      const structures = s.structures.slice();
      structures[t.structure] = shiftStructure(structures[t.structure]!, t.field, d, doc.settings.quantity);
      species[t.species] = { ...s, structures };
    } else if (t.kind === 'species') {
      species[t.species] = shiftSpecies(species[t.species]!, d);
    } else {
      const s = species[t.species]!;
      species[t.species] = { ...s, formation: { ...s.formation, [t.field]: s.formation![t.field]! + d } };
    }
  });
  for (const [pi, list] of points) pathways[pi] = { ...pathways[pi]!, points: list };
  return { ...doc, pathways, species };
}
