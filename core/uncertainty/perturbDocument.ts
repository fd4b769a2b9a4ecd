import type { Document, EnergySpec, Point, Species, Structure } from '../model/schema.ts';
import type { InputTarget, UncertainInput } from './uncertainInputs.ts';

/**
 * A positive input (rate constant, half-life) moved by `delta` in its own unit, log-normally:
 * value·exp(delta/value), i.e. ln value ~ N(ln value₀, (σ/value₀)²) for delta = z·σ. Chosen
 * over a normal (which can reach k ≤ 0, where no barrier exists) and over a truncated normal
 * (whose rejections bias the tail): it never leaves k > 0, keeps the entered value as the
 * median, matches σ to first order (σ_ln = σ/value is the relative standard uncertainty), and
 * makes the Eyring barrier ±RT ln k exactly normal, so a measured k and a computed barrier
 * carry the same kind of error (GUM, JCGM 101:2008 §6.4.6 for log-normal inputs; citation and section from memory, tests/REFERENCES.md §12).
 */
export function logNormalShift(value: number, delta: number): number {
  return value * Math.exp(delta / value);
}

type PointField = Extract<InputTarget, { kind: 'point' }>['field'];

function shiftPoint(point: Point, field: PointField, delta: number): Point {
  const e = point.energy;
  let energy: EnergySpec = e;
  if (field === 'value' && (e.mode === 'value' || e.mode === 'step' || e.mode === 'barrier')) energy = { ...e, value: e.value + delta };
  else if (e.mode === 'estimate') {
    const est = e.estimate;
    if (field === 'lambda' && est.method === 'marcus') energy = { ...e, estimate: { ...est, lambda: est.lambda + delta } };
    else if (field === 'e0' && est.method === 'bep') energy = { ...e, estimate: { ...est, e0: est.e0 + delta } };
    else if (field === 'k' && est.method === 'rateConstant') energy = { ...e, estimate: { ...est, k: logNormalShift(est.k, delta) } };
    else if (field === 'seconds' && est.method === 'halfLife') energy = { ...e, estimate: { ...est, seconds: logNormalShift(est.seconds, delta) } };
  }
  return { ...point, energy };
}

function shiftRatePoint(point: Point, index: number, delta: number): Point {
  const e = point.energy;
  if (e.mode !== 'estimate' || (e.estimate.method !== 'eyringFit' && e.estimate.method !== 'arrhenius')) return point;
  const data = e.estimate.data.slice();
  data[index] = { ...data[index]!, k: logNormalShift(data[index]!.k, delta) };
  return { ...point, energy: { ...e, estimate: { ...e.estimate, data } } };
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
 * An ordinary document with `deltas[i]` (in input i's own unit) added to input i — or, for a
 * log-normal input (rate constant, half-life), applied by {@link logNormalShift}. Only the
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
    } else if (t.kind === 'ratePoint') {
      const list = pointsOf(t.pathway);
      list[t.point] = shiftRatePoint(list[t.point]!, t.index, d);
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
