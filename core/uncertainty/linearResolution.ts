import type { Document } from '../model/schema.ts';
import { resolveProfile } from '../profile/resolve.ts';
import type { ResolvedProfile } from '../profile/types.ts';
import { perturbDocument } from './perturbDocument.ts';
import type { UncertainInput } from './uncertainInputs.ts';

function flatten(profile: ResolvedProfile): Float64Array {
  const out: number[] = [];
  for (const p of profile.pathways) for (const q of p.points) out.push(q.energyJ ?? Number.NaN);
  return Float64Array.from(out);
}

/**
 * Inputs that `resolveProfile` adds into point energies with a fixed weight: typed values,
 * steps, barriers (sums), BEP E₀ (a sum), formation values (Σ count × ΔfX°), a single
 * structure's energy or correction, and a whole species' shift (G_eff(x + δ) = G_eff(x) + δ).
 * Rate constants and half-lives are sampled log-normally, ln k = ln k₀ + z·σ/k₀, and every
 * estimate built on them is linear in ln k: inverse Eyring (Δ‡G = RT ln(κk_BT/h) − RT ln k),
 * the half-life (+RT ln t½), and the least-squares Eyring and Arrhenius lines (slope and
 * intercept are fixed linear combinations of the ln k values), so they stay on this path.
 * A Marcus estimate depends on its neighbours quadratically and a single conformer of an
 * ensemble moves G_eff non-linearly: documents with those are sampled in full.
 */
function isLinear(doc: Document, inputs: readonly UncertainInput[]): boolean {
  if (doc.pathways.some((p) => p.points.some((q) => q.energy.mode === 'estimate' && q.energy.estimate.method === 'marcus'))) return false;
  return inputs.every((i) => i.target.kind !== 'structure' || doc.species[i.target.species]!.structures.length === 1);
}

/**
 * A fast path for sampling: when every input enters the resolution linearly, one call of
 * `resolveProfile` per input gives its column of point-energy shifts, and each sample's
 * profile is the point estimate plus Σ z_i·column_i — the same resolver, evaluated once per
 * input instead of once per sample. The linearity is checked at two trial points against a
 * full resolution (≤ 1e-6 J/mol); null when it does not hold, so the caller samples in full.
 * The returned function fills and returns one profile object, reused by the next call (no
 * allocation per sample): read it before asking for the next sample. Everything but the point
 * energies is the point estimate's (scale keys, provenance, findings).
 */
export function linearResolution(doc: Document, inputs: readonly UncertainInput[], base: ResolvedProfile): ((z: ArrayLike<number>, offset?: number) => ResolvedProfile) | null {
  if (!isLinear(doc, inputs)) return null;
  const m = inputs.length;
  const e0 = flatten(base);
  const n = e0.length;
  // Point-major (k·m + i), so one sample's energy of point k is a contiguous dot product.
  const columns = new Float64Array(m * n);
  const deltas = new Float64Array(m);
  inputs.forEach((input, i) => {
    deltas.fill(0);
    deltas[i] = input.sigma;
    const shifted = flatten(resolveProfile(perturbDocument(doc, inputs, deltas)));
    for (let k = 0; k < n; k++) columns[k * m + i] = shifted[k]! - e0[k]!;
  });
  // Each point's non-zero column entries (a typed value moves one point; a step the points after it).
  const rowStart = new Int32Array(n + 1);
  const nonZero: number[] = [];
  const weights: number[] = [];
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < m; i++) {
      const c = columns[k * m + i]!;
      if (c !== 0) { nonZero.push(i); weights.push(c); }
    }
    rowStart[k + 1] = nonZero.length;
  }
  const index = Int32Array.from(nonZero);
  const weight = Float64Array.from(weights);
  const energies = new Float64Array(n);
  // Terms are added in input order onto e0 and an input with z = 0 adds nothing, as the dense
  // sum over all inputs does. Leaving out a zero entry (z·0 = ±0) changes a sum only while it is
  // zero (−0 + 0 = +0): a point whose sparse sum is zero is summed densely, so the result is the
  // dense sum bit for bit.
  const dense = (z: ArrayLike<number>, offset: number, k: number) => {
    let e = e0[k]!;
    const row = k * m;
    for (let i = 0; i < m; i++) {
      const zi = z[offset + i]!;
      if (zi !== 0) e += zi * columns[row + i]!;
    }
    return e;
  };
  const predict = (z: ArrayLike<number>, offset = 0) => {
    for (let k = 0; k < n; k++) {
      let e = e0[k]!;
      for (let p = rowStart[k]!; p < rowStart[k + 1]!; p++) {
        const zi = z[offset + index[p]!]!;
        if (zi !== 0) e += zi * weight[p]!;
      }
      energies[k] = e === 0 ? dense(z, offset, k) : e;
    }
    return energies;
  };
  for (const trial of [Float64Array.from(inputs, () => 1), Float64Array.from(inputs, (_, i) => (i % 2 ? -2 : 1.5))]) {
    const full = flatten(resolveProfile(perturbDocument(doc, inputs, trial.map((z, i) => z * inputs[i]!.sigma))));
    const linear = predict(trial);
    for (let k = 0; k < n; k++) {
      if (Number.isNaN(full[k]!) !== Number.isNaN(linear[k]!)) return null;
      if (Math.abs(full[k]! - linear[k]!) > 1e-6 + 1e-12 * Math.abs(full[k]!)) return null;
    }
  }
  const points = base.pathways.flatMap((p) => p.points.map((q) => ({ ...q })));
  let next = 0;
  const profile: ResolvedProfile = { ...base, pathways: base.pathways.map((p) => ({ ...p, points: points.slice(next, (next += p.points.length)) })) };
  return (z, offset = 0) => {
    const e = predict(z, offset);
    for (let k = 0; k < n; k++) points[k]!.energyJ = Number.isNaN(e[k]!) ? null : e[k]!;
    return profile;
  };
}
