import { describe, expect, it } from 'vitest';
import { makeDocument } from '../../../core/model/load.ts';
import type { Document } from '../../../core/model/schema.ts';
import { analyseUncertainty, type UncertaintyResult } from '../../../core/uncertainty/uncertaintyRun.ts';
import { rtJoules } from '../../../core/units/thermal.ts';
import { kcalToHartree, onePathway, species, state, typed } from '../profile/builders.ts';

// Two-sided 95 % quantile of the standard normal, z₀.₉₇₅ = 1.959963985 (Abramowitz & Stegun,
// Handbook of Mathematical Functions, 1964, Table 26.5, from memory; also scipy.stats.norm.ppf(0.975)).
const Z975 = 1.959963985;
const RT_KCAL = rtJoules(298.15) / 4184;

/** A point with a typed value (kcal/mol) and its σ. */
const withSigma = (id: string, kind: 'min' | 'ts', kcal: number, sigma: number) => typed(id, kind, kcal, { energy: { mode: 'value', value: kcal, unit: 'kcal/mol', sigma } });
const step = (id: string, kind: 'min' | 'ts', kcal: number, sigma: number) => typed(id, kind, kcal, { energy: { mode: kind === 'ts' ? 'barrier' : 'step', value: kcal, unit: 'kcal/mol', sigma } });

function quantity(result: UncertaintyResult, key: string) {
  const q = result.quantities.find((x) => x.key === key);
  if (!q?.interval) throw new Error(`no interval for ${key}`);
  return { point: q.point!, ...q.interval };
}

/** σ implied by a 95 % interval of a normal, in kcal/mol. */
const sigmaOf = (q: { low: number; high: number }) => (q.high - q.low) / (2 * Z975) / 4184;

describe('uncertainty: one barrier with σ (Eyring–Polanyi; normal quantiles)', () => {
  // k = κ(k_BT/h)exp(−Δ‡G/RT) with Δ‡G ~ N(Δ‡G₀, σ²) is log-normal: its 2.5/97.5 % points are k₀·exp(∓z σ/RT).
  const doc = onePathway([typed('R', 'min', 0), step('TS', 'ts', 20, 1.0), typed('P', 'min', -5)]);
  const result = analyseUncertainty(doc, { samples: 40_000, seed: 7 });
  const k = quantity(result, 'a/step 0/kForward');
  const spread = 1.0 / RT_KCAL;
  // Monte Carlo tolerance: the s.e. of a 2.5 % sample quantile of N normals is √(p(1−p)/N)/φ(z) ≈ 0.013 σ at N = 40 000; allow 4 s.e.
  const tol = 4 * Math.sqrt(0.025 * 0.975 / 40_000) / 0.05844 * spread;

  it('gives percentiles k₀·exp(∓1.959964 σ/RT) of k (stored as ln k)', () => {
    expect(Math.abs(k.low - (k.point - Z975 * spread))).toBeLessThan(tol);
    expect(Math.abs(k.high - (k.point + Z975 * spread))).toBeLessThan(tol);
    expect(Math.abs(k.median - k.point)).toBeLessThan(tol);
  });

  it('states the samples, seed and the input σ', () => {
    expect(result).toMatchObject({ samples: 40_000, seed: 7 });
    expect(result.inputs).toEqual([expect.objectContaining({ key: 'a/TS/value', sigma: 1, unit: 'kcal/mol', isDefault: false })]);
  });

  it('moves every later point with the barrier\'s σ but not the one before it', () => {
    expect(result.quantities.find((q) => q.key === 'a/R/energy')!.interval).toMatchObject({ low: 0, high: 0 });
    expect(Math.abs(sigmaOf(quantity(result, 'a/TS/energy')) - 1)).toBeLessThan(0.03);
  });
});

describe('uncertainty: sums in quadrature, shared species cancel (propagation of independent errors, GUM JCGM 100:2008 §5.1, from memory)', () => {
  it('a point two independent steps away has σ = √(σ₁² + σ₂²)', () => {
    const doc = onePathway([typed('I1', 'min', 0), step('I2', 'min', -3, 1.2), step('I3', 'min', -2, 0.5)]);
    const result = analyseUncertainty(doc, { samples: 20_000, seed: 3 });
    expect(Math.abs(sigmaOf(quantity(result, 'a/I3/energy')) - Math.hypot(1.2, 0.5)) / Math.hypot(1.2, 0.5)).toBeLessThan(0.03);
  });

  it('a species in both states cancels in their difference', () => {
    // cat carries a large σ (0.01 hartree ≈ 6.3 kcal/mol) but appears in both states; only the two substrates' σ remain.
    const sigmaSub = kcalToHartree(0.8);
    const sub = (id: string, kcal: number) => species(id, kcal, { structures: [{ electronic: kcalToHartree(kcal), gCorrection: 0, hCorrection: 0, sigma: sigmaSub }] });
    const doc = onePathway([state('S1', 'min', [['cat', 1], ['s1', 1]]), state('S2', 'min', [['cat', 1], ['s2', 1]])], {
      species: [species('cat', -1000, { structures: [{ electronic: kcalToHartree(-1000), gCorrection: 0, hCorrection: 0, sigma: 0.01 }] }), sub('s1', -200), sub('s2', -203)],
    });
    const result = analyseUncertainty(doc, { samples: 20_000, seed: 11 });
    expect(Math.abs(sigmaOf(quantity(result, 'a/S2/energy')) - Math.hypot(0.8, 0.8)) / Math.hypot(0.8, 0.8)).toBeLessThan(0.03);
  });
});

function competing(ddgKcal: number, sigma: number): Document {
  const pathway = (id: string, ts: number) => ({ id, name: id, points: [typed('R', 'min', 0), withSigma('TS', 'ts', ts, sigma), typed('P', 'min', -10)] });
  return makeDocument({ pathways: [pathway('A', 15), pathway('B', 15 + ddgKcal)], comparisons: [{ type: 'selectivity', pathways: ['A', 'B'] }, { type: 'rate', baseline: 'B', candidate: 'A' }] });
}

describe('uncertainty: two competing TSs from one start (normal CDF)', () => {
  // ΔΔG‡ = σ√2 makes the standardised difference 1: P(A faster) = Φ(1) = 0.8413447461 (Abramowitz & Stegun Table 26.1, from memory).
  const result = analyseUncertainty(competing(Math.SQRT2, 1), { samples: 20_000, seed: 5 });
  const tol = 4 * Math.sqrt(0.8413 * 0.1587 / 20_000);

  it('P(A faster) = Φ(ΔΔG‡/(σ√2)) for the rate comparison and the selectivity', () => {
    const faster = result.choices.find((c) => c.key === 'comparison 1/faster')!;
    const major = result.choices.find((c) => c.key === 'comparison 0/major')!;
    expect(Math.abs(faster.probabilities.A! - 0.8413447461)).toBeLessThan(tol);
    expect(Math.abs(major.probabilities.A! - 0.8413447461)).toBeLessThan(tol);
  });

  it('gives intervals on the product shares that contain the point estimate', () => {
    const share = quantity(result, 'comparison 0/A/percent');
    expect(share.low).toBeLessThan(share.point);
    expect(share.high).toBeGreaterThan(share.point);
    expect(share.high).toBeLessThanOrEqual(100);
  });
});

describe('uncertainty: energetic span (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011))', () => {
  it('two equal spans: each TS is the TDTS with probability ½', () => {
    // Spans: T1 − I1 = 15, T2 − I2 = 15, T1 − I2 + ΔG_r = 13, T2 − I1 = 12 kcal/mol (REFERENCE.md §6 convention).
    const doc = onePathway([typed('I1', 'min', 0), withSigma('T1', 'ts', 15, 1), typed('I2', 'min', -3), withSigma('T2', 'ts', 12, 1), typed('I1′', 'min', -5)], {}, true);
    const result = analyseUncertainty(doc, { samples: 20_000, seed: 9 });
    const tdts = result.choices.find((c) => c.key === 'a/span/tdts')!.probabilities;
    const tol = 4 * 0.5 / Math.sqrt(20_000);
    expect(Math.abs(tdts.T1! - 0.5)).toBeLessThan(tol);
    expect(Math.abs(tdts.T2! - 0.5)).toBeLessThan(tol);
    // Which input matters for the TOF: both TSs, about equally, nothing else.
    const shares = result.sensitivity[0]!.shares;
    expect(shares.map((s) => s.key).sort()).toEqual(['a/T1/value', 'a/T2/value']);
    expect(Math.abs(shares[0]!.share - shares[1]!.share)).toBeLessThan(0.05);
  });
});

describe('uncertainty: Monte Carlo error', () => {
  it('shrinks as 1/√N (spread over seeds of the 97.5 % point, N = 500 vs 8 000)', () => {
    const doc = onePathway([typed('R', 'min', 0), step('TS', 'ts', 20, 1.0), typed('P', 'min', -5)]);
    const spreadOver = (samples: number) => {
      const highs = Array.from({ length: 16 }, (_, seed) => quantity(analyseUncertainty(doc, { samples, seed: seed + 100 }), 'a/TS/energy').high);
      const mean = highs.reduce((a, b) => a + b) / highs.length;
      return Math.sqrt(highs.reduce((a, b) => a + (b - mean) ** 2, 0) / (highs.length - 1));
    };
    // Expected ratio √(8000/500) = 4; with 16 seeds the spread itself is known to about ±18 %, hence the band.
    const ratio = spreadOver(500) / spreadOver(8000);
    expect(ratio).toBeGreaterThan(2.6);
    expect(ratio).toBeLessThan(6.2);
  }, 60_000);

  it('is reproducible: the same seed gives the same intervals', () => {
    const doc = onePathway([typed('R', 'min', 0), step('TS', 'ts', 20, 1.0), typed('P', 'min', -5)]);
    expect(analyseUncertainty(doc, { samples: 500, seed: 42 }).quantities).toEqual(analyseUncertainty(doc, { samples: 500, seed: 42 }).quantities);
  });
});

describe('uncertainty: the fast path is the full pipeline', () => {
  it('linear resolution and sampling every document in full agree to 1e-9', () => {
    const doc = onePathway([state('S1', 'min', [['cat', 1], ['s', 1]]), step('T', 'ts', 18, 0.7), state('S2', 'min', [['cat', 1], ['p', 1]])], {
      species: [species('cat', -1000), species('s', -200), species('p', -215)],
      settings: { uncertainty: { defaultSigma: 1.5, defaultSigmaUnit: 'kcal/mol' } },
    });
    const fast = analyseUncertainty(doc, { samples: 300, seed: 2 });
    const full = analyseUncertainty(doc, { samples: 300, seed: 2, full: true });
    expect([fast.method, full.method]).toEqual(['linear-resolution', 'full']);
    expect(fast.inputs.map((i) => [i.key, i.isDefault])).toEqual([['a/T/value', false], ['species cat/energy', true], ['species s/energy', true], ['species p/energy', true]]);
    fast.quantities.forEach((q, i) => {
      const f = full.quantities[i]!;
      for (const k of ['median', 'low', 'high'] as const) expect(Math.abs(q.interval![k] - f.interval![k])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(f.interval![k])));
    });
  });

  it('a Marcus estimate (non-linear in its neighbours) is sampled in full', () => {
    const doc = onePathway([typed('R', 'min', 0), { id: 'TS', label: 'TS', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'marcus', lambda: 20, unit: 'kcal/mol', lambdaSigma: 2 } } }, withSigma('P', 'min', -10, 1)]);
    const result = analyseUncertainty(doc, { samples: 200, seed: 1 });
    expect(result.method).toBe('full');
    expect(result.inputs.map((i) => i.key)).toEqual(['a/TS/lambda', 'a/P/value']);
  });

  it('no σ anywhere: every interval collapses to the point estimate', () => {
    const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20), typed('P', 'min', -5)]);
    const result = analyseUncertainty(doc, { samples: 50, seed: 1 });
    expect(result.inputs).toEqual([]);
    const k = quantity(result, 'a/step 0/kForward');
    expect([k.low, k.high]).toEqual([k.point, k.point]);
  });
});

describe('uncertainty: the fast path keeps what the analysis reads from the resolved profile', () => {
  it('pathways that do not share a zero get no selectivity in either path (the fast path kept no scale key)', () => {
    // Per-pathway zeros (reference "first"); B's first state is typed 2, not 0, so B keeps a zero of
    // its own (referenceFrame: scale key "pathway:B") and competingPathways refuses the selectivity.
    const pathway = (id: string, start: number, ts: number) => ({ id, name: id, points: [typed('R', 'min', start), withSigma('TS', 'ts', ts, 1), typed('P', 'min', -10)] });
    const doc = makeDocument({ settings: { reference: { kind: 'first' } }, pathways: [pathway('A', 0, 15), pathway('B', 2, 17)], comparisons: [{ type: 'selectivity', pathways: ['A', 'B'] }] });
    const fast = analyseUncertainty(doc, { samples: 50, seed: 1 });
    const full = analyseUncertainty(doc, { samples: 50, seed: 1, full: true });
    expect(fast.method).toBe('linear-resolution');
    const major = (r: UncertaintyResult) => r.choices.find((c) => c.key === 'comparison 0/major')!;
    expect([major(full).point, major(full).probabilities]).toEqual([null, {}]);
    expect([major(fast).point, major(fast).probabilities]).toEqual([null, {}]);
  });
});
