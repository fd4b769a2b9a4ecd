import { Matrix, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { DocumentInput } from '../../../core/model/schema.ts';
import { analyseUncertainty, type UncertaintyResult } from '../../../core/uncertainty/uncertaintyRun.ts';
import { onePathway, typed } from '../profile/builders.ts';

// CODATA 2018 exact constants (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)), written out
// here rather than imported so the reference does not share the code under test.
const H = 6.62607015e-34, KB = 1.380649e-23, NA = 6.02214076e23;
const R = KB * NA;
// z₀.₉₇₅ of the standard normal (Abramowitz & Stegun 1964, Table 26.5, from memory; scipy.stats.norm.ppf(0.975)).
const Z975 = 1.959963985;
const T0 = 298.15;
const N = 20_000;
/** 4 standard errors of a 2.5 % sample quantile of N normals with sd 1: √(p(1−p)/N)/φ(z₀.₉₇₅) (normal-theory s.e. of a quantile). */
const QUANTILE_TOL = 4 * Math.sqrt(0.025 * 0.975 / N) / 0.05844;
/** 4 standard errors of a sample sd, sd/√(2N) (normal theory). */
const SD_TOL = 4 / Math.sqrt(2 * N);

type Estimate = Extract<NonNullable<DocumentInput['pathways']>[number]['points'][number]['energy'], { mode: 'estimate' }>['estimate'];
const estimated = (estimate: Estimate, settings: DocumentInput['settings'] = {}) =>
  onePathway([typed('R', 'min', 0), { id: 'TS', label: 'TS', kind: 'ts', energy: { mode: 'estimate', estimate } }, typed('P', 'min', -5)], { settings });

function barrier(result: UncertaintyResult) {
  const q = result.quantities.find((x) => x.key === 'a/step 0/barrierForward')!;
  return { point: q.point!, ...q.interval! };
}

/** The MC barrier is normal with sd `sd` around `point`: check median, 2.5/97.5 % points and sd. */
function expectNormalBarrier(result: UncertaintyResult, point: number, sd: number) {
  const b = barrier(result);
  expect(Math.abs(b.point - point) / point).toBeLessThan(1e-9);
  expect(Math.abs(b.low - (point - Z975 * sd))).toBeLessThan(QUANTILE_TOL * sd);
  expect(Math.abs(b.high - (point + Z975 * sd))).toBeLessThan(QUANTILE_TOL * sd);
  expect(Math.abs(b.median - point)).toBeLessThan(QUANTILE_TOL * sd);
  expect(Math.abs(b.sd - sd) / sd).toBeLessThan(SD_TOL);
}

describe('σ of a rate constant: Δ‡G = RT ln(k_BT/(hk)) (Eyring–Polanyi; IUPAC Gold Book "Gibbs energy of activation")', () => {
  // REFERENCE.md §2: k = 8.59300518801e-5 s⁻¹ at 298.15 K ↔ Δ‡G = 23.000 kcal/mol; σ = 25 % of k.
  const k = 8.59300518801e-5;
  const sigmaLn = 0.25;
  const doc = estimated({ method: 'rateConstant', k, kSigma: sigmaLn * k });
  const result = analyseUncertainty(doc, { samples: N, seed: 21 });
  const dG0 = R * T0 * Math.log((KB * T0) / (H * k));

  it('log-normal k gives barrier percentiles exactly Δ‡G₀ ∓ 1.959964·RT·σ/k', () => {
    expect(dG0 / 4184).toBeCloseTo(23, 9);
    expectNormalBarrier(result, dG0, R * T0 * sigmaLn);
  });

  it('the step rate constant comes back log-normal around the entered k: k·exp(∓1.959964 σ/k)', () => {
    const kq = result.quantities.find((x) => x.key === 'a/step 0/kForward')!;
    expect(Math.abs(kq.point! - Math.log(k))).toBeLessThan(1e-9);
    expect(Math.abs(kq.interval!.low - (Math.log(k) - Z975 * sigmaLn))).toBeLessThan(QUANTILE_TOL * sigmaLn);
    expect(Math.abs(kq.interval!.high - (Math.log(k) + Z975 * sigmaLn))).toBeLessThan(QUANTILE_TOL * sigmaLn);
  });

  it('is listed as a log-normal input in the unit of k, and stays on the linear fast path', () => {
    expect(result.method).toBe('linear-resolution');
    expect(result.inputs).toEqual([expect.objectContaining({ key: 'a/TS/k', sigma: sigmaLn * k, unit: 's⁻¹', distribution: 'logNormal' })]);
    expect(result.inputs[0]!.sigmaJ).toBeCloseTo(R * T0 * sigmaLn, 9);
  });
});

describe('σ of a half-life: t½ = ln 2/k, first order (IUPAC Gold Book "half life")', () => {
  // REFERENCE.md §2: t½ = 1 h at 298.15 K ↔ Δ‡G = 22.52199802 kcal/mol; σ = 540 s (15 %).
  const doc = estimated({ method: 'halfLife', seconds: 3600, secondsSigma: 540 });
  const result = analyseUncertainty(doc, { samples: N, seed: 22 });

  it('gives Δ‡G₀ ∓ 1.959964·RT·σ/t½ around RT ln(k_BT t½/(h ln 2))', () => {
    const dG0 = R * T0 * Math.log((KB * T0 * 3600) / (H * Math.LN2));
    expect(dG0 / 4184).toBeCloseTo(22.52199802, 7);
    expectNormalBarrier(result, dG0, R * T0 * 0.15);
    expect(result.inputs[0]).toMatchObject({ unit: 's', label: 'TS (A): half-life' });
  });
});

// REFERENCE.md §3 synthetic data: Δ‡H = 75 312 J/mol, Δ‡S = −41.84 J/(mol K), first order, κ = 1.
const TEMPS = [278.15, 288.15, 298.15, 308.15, 318.15];
const DH = 75_312, DS = -41.84;
const kAt = (t: number) => ((KB * t) / H) * Math.exp(DS / R) * Math.exp(-DH / (R * t));

/**
 * First-order propagation for a least-squares line y = a + b·x fitted without weights, with
 * independent errors σ_i on y_i: β = (XᵀX)⁻¹Xᵀy, so Cov(β) = (XᵀX)⁻¹XᵀΣX(XᵀX)⁻¹ (e.g. Draper &
 * Smith, Applied Regression Analysis, 3rd ed., 1998, §2.1, from memory), evaluated with ml-matrix.
 */
function lineCovariance(x: number[], sigmas: number[]): Matrix {
  const X = new Matrix(x.map((v) => [1, v]));
  const A = inverse(X.transpose().mmul(X)).mmul(X.transpose());
  return A.mmul(Matrix.diag(sigmas.map((s) => s * s))).mmul(A.transpose());
}

/** sd of R·(T·a + b) (Δ‡G at T from either line) and of R·b (Δ‡H, E_a) from Cov([a, b]). */
function lineSds(cov: Matrix, t: number) {
  const [vaa, vab, vbb] = [cov.get(0, 0), cov.get(0, 1), cov.get(1, 1)];
  return { atT: R * Math.sqrt(t * t * vaa + 2 * t * vab + vbb), slope: R * Math.sqrt(vbb) };
}

for (const method of ['eyringFit', 'arrhenius'] as const) {
  const plot = method === 'eyringFit' ? 'ln(k/T)' : 'ln k';
  describe(`σ on the (T, k) points of ${method === 'eyringFit' ? 'an Eyring plot' : 'an Arrhenius fit'}: spread of a least-squares line of ${plot} on 1/T`, () => {
    const x = TEMPS.map((t) => 1 / t);
    const relative = [0.05, 0.1, 0.08, 0.12, 0.06];
    const data = TEMPS.map((t, i) => ({ temperatureK: t, k: kAt(t), kSigma: relative[i]! * kAt(t) }));
    const sds = lineSds(lineCovariance(x, relative), T0);

    it('Δ‡G (profile in G) spreads as first-order propagation through the fit, and is normal', () => {
      const result = analyseUncertainty(estimated({ method, data }), { samples: N, seed: 23 });
      expect(result.method).toBe('linear-resolution');
      expect(result.inputs.map((i) => i.key)).toEqual(TEMPS.map((_, i) => `a/TS/data ${i}/k`));
      expectNormalBarrier(result, barrier(result).point, sds.atT);
      if (method === 'eyringFit') expect(barrier(result).point / 4184).toBeCloseTo(20.9815, 6);
    });

    it(`${method === 'eyringFit' ? 'Δ‡H' : 'E_a − RT'} (profile in H) spreads as R·σ(slope)`, () => {
      const result = analyseUncertainty(estimated({ method, data }, { quantity: 'H' }), { samples: N, seed: 24 });
      expectNormalBarrier(result, barrier(result).point, sds.slope);
      // Point values, REFERENCE.md §3: Δ‡H = 18.0 kcal/mol; least-squares E_a = 18.590505763712 kcal/mol.
      const expected = method === 'eyringFit' ? 18 : 18.590505763712 - (R * T0) / 4184;
      expect(barrier(result).point / 4184).toBeCloseTo(expected, 6);
    });
  });
}

describe('equal relative σ on every point: the weighted least-squares standard errors', () => {
  it('σ(Δ‡H) = R σ_ln/√Sxx and σ(Δ‡G(T)) = R T σ_ln √(1/n + (x̄ − 1/T)²/Sxx) (weights 1/σ², Draper & Smith §9.2, from memory)', () => {
    const s = 0.1;
    const data = TEMPS.map((t) => ({ temperatureK: t, k: kAt(t), kSigma: s * kAt(t) }));
    const x = TEMPS.map((t) => 1 / t);
    const xm = x.reduce((a, b) => a + b) / x.length;
    const sxx = x.reduce((a, v) => a + (v - xm) ** 2, 0);
    const g = analyseUncertainty(estimated({ method: 'eyringFit', data }), { samples: N, seed: 25 });
    expectNormalBarrier(g, barrier(g).point, R * T0 * s * Math.sqrt(1 / x.length + (xm - 1 / T0) ** 2 / sxx));
    const h = analyseUncertainty(estimated({ method: 'eyringFit', data }, { quantity: 'H' }), { samples: N, seed: 26 });
    expectNormalBarrier(h, barrier(h).point, (R * s) / Math.sqrt(sxx));
  });
});

describe('rate-based estimates on the fast path are the full pipeline', () => {
  it('linear resolution and full sampling agree to 1e-9 for all four estimate methods in one pathway', () => {
    const data = TEMPS.map((t, i) => ({ temperatureK: t, k: kAt(t), kSigma: (0.05 + 0.02 * i) * kAt(t) }));
    const ts = (id: string, estimate: Estimate) => ({ id, label: id, kind: 'ts' as const, energy: { mode: 'estimate' as const, estimate } });
    const doc = onePathway([
      typed('I1', 'min', 0), ts('T1', { method: 'rateConstant', k: 0.02, kSigma: 0.004, molecularity: 2, temperatureK: 310 }),
      typed('I2', 'min', -2), ts('T2', { method: 'halfLife', seconds: 90, secondsSigma: 30 }),
      typed('I3', 'min', -4), ts('T3', { method: 'eyringFit', data }),
      typed('I4', 'min', -6), ts('T4', { method: 'arrhenius', data }), typed('I5', 'min', -9),
    ]);
    const fast = analyseUncertainty(doc, { samples: 400, seed: 4 });
    const full = analyseUncertainty(doc, { samples: 400, seed: 4, full: true });
    expect([fast.method, full.method]).toEqual(['linear-resolution', 'full']);
    expect(fast.inputs).toHaveLength(12);
    fast.quantities.forEach((q, i) => {
      const f = full.quantities[i]!;
      if (!f.interval) return expect(q.interval).toBeNull();
      for (const k of ['median', 'low', 'high'] as const) expect(Math.abs(q.interval![k] - f.interval[k])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(f.interval[k])));
    });
  });
});
