import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { analysisTables, type AnalysisTables } from '../../../core/export/analysisTables.ts';
import type { Table } from '../../../core/export/tables.ts';
import { tablesToCsv, tablesToMarkdown } from '../../../core/export/tablesDocument.ts';
import type { Document } from '../../../core/model/schema.ts';
import { makeDocument } from '../../../core/model/load.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';
import { annotateReport } from '../../../core/uncertainty/annotateReport.ts';
import { analyseUncertainty, type UncertaintyResult } from '../../../core/uncertainty/uncertaintyRun.ts';
import { rtJoules } from '../../../core/units/thermal.ts';
import { onePathway, typed } from '../profile/builders.ts';
import { analysedDocument } from './analysisFixture.ts';

// Two-sided 95 % quantile of the standard normal, z₀.₉₇₅ = 1.959963985 (Abramowitz & Stegun,
// Handbook of Mathematical Functions, 1964, Table 26.5, from memory).
const Z975 = 1.959963985;

const sig = (x: number) => Number(x.toPrecision(4));
const column = (t: Table, title: string) => {
  const i = t.columns.indexOf(title);
  if (i < 0) throw new Error(`no column "${title}" in ${t.columns.join(' | ')}`);
  return t.rows.map((r) => r[i]);
};
const q = (result: UncertaintyResult, key: string) => {
  const found = result.quantities.find((x) => x.key === key);
  if (!found?.interval) throw new Error(`no interval for ${key}`);
  return found.interval;
};

function tablesOf(doc: Document, run?: UncertaintyResult): AnalysisTables {
  const report = analysisReport(doc, analyseDocument(doc));
  return analysisTables(run ? annotateReport(report, run) : report, 1);
}

describe('analysis tables with a Monte Carlo run: one barrier with σ (Eyring–Polanyi; normal quantiles)', () => {
  // Invented: R 0, TS barrier 20 ± 1 kcal/mol, P −5. k = (k_BT/h)exp(−Δ‡G/RT) with a normal Δ‡G is
  // log-normal, so its 2.5 / 97.5 % points are exactly k₀·exp(∓1.959964 σ/RT) (issue 18's check).
  const doc = onePathway([typed('R', 'min', 0), typed('TS', 'ts', 20, { energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -5)]);
  const run = analyseUncertainty(doc, { samples: 40_000, seed: 7 });
  const tables = tablesOf(doc, run);
  const k0 = tables.steps.rows[0]![tables.steps.columns.indexOf('k forward (unit in next column)')] as number;
  const spread = 4184 / rtJoules(298.15);

  it('puts the run\'s own percentiles of k beside k, rounded as k is', () => {
    const k = q(run, 'a/step 0/kForward');
    expect(column(tables.steps, 'k forward, 2.5 % (unit in k forward unit)')).toEqual([sig(Math.exp(k.low))]);
    expect(column(tables.steps, 'k forward, median (unit in k forward unit)')).toEqual([sig(Math.exp(k.median))]);
    expect(column(tables.steps, 'k forward, 97.5 % (unit in k forward unit)')).toEqual([sig(Math.exp(k.high))]);
  });

  it('matches k₀·exp(∓1.959964 σ/RT) within the Monte Carlo tolerance', () => {
    // s.e. of a 2.5 % sample quantile of N normals: √(p(1−p)/N)/φ(z) ≈ 0.013 σ at N = 40 000; allow 4 s.e. (in ln k).
    const tol = (4 * Math.sqrt(0.025 * 0.975 / 40_000) / 0.05844) * spread;
    const [low] = column(tables.steps, 'k forward, 2.5 % (unit in k forward unit)') as number[];
    const [high] = column(tables.steps, 'k forward, 97.5 % (unit in k forward unit)') as number[];
    expect(Math.abs(Math.log(low! / k0) + Z975 * spread)).toBeLessThan(tol);
    expect(Math.abs(Math.log(high! / k0) - Z975 * spread)).toBeLessThan(tol);
    // The barrier itself: 20 ∓ 1.96 kcal/mol.
    expect(column(tables.steps, 'ΔG‡ forward, 2.5 % / kcal mol⁻¹')[0]).toBeCloseTo(20 - Z975, 1);
    expect(column(tables.steps, 'ΔG‡ forward, 97.5 % / kcal mol⁻¹')[0]).toBeCloseTo(20 + Z975, 1);
  });

  it('states N, the seed and the input σ with its unit and where it came from', () => {
    expect(tables.uncertainty!.run.rows[0]!.slice(0, 2)).toEqual([40_000, 7]);
    expect(tables.uncertainty!.inputs.rows).toEqual([['TS (A): barrier', 1, 'kcal mol⁻¹', 'typed with the input']]);
    const md = tablesToMarkdown(tables, 'x');
    expect(md).toContain('N = 40000 samples, seed 7');
    expect(md).toContain('Input σ: TS (A): barrier 1 kcal mol⁻¹');
    const csv = tablesToCsv(tables);
    expect(csv.startsWith('Uncertainty run\r\nsamples N,seed,method,interval\r\n40000,7,')).toBe(true);
    expect(csv).toContain('TS (A): barrier,1,kcal mol⁻¹,typed with the input');
  });
});

describe('analysis tables with a Monte Carlo run: cycle A and a rate comparison, default σ 1 kcal/mol', () => {
  const { doc } = analysedDocument({ settings: { uncertainty: { defaultSigma: 1, defaultSigmaUnit: 'kcal/mol', samples: 2000, seed: 4 } } } as never);
  const run = analyseUncertainty(doc);
  const tables = tablesOf(doc, run);
  const plain = tablesOf(doc);

  it('gives the median and 95 % interval of δE, TOF and the effective barriers from the run', () => {
    const dE = q(run, 'A/span/deltaE');
    const kcal = (j: number) => Number((j / 4184).toFixed(1));
    expect(column(tables.energeticSpans, 'δE, median / kcal mol⁻¹')).toEqual([kcal(dE.median)]);
    expect(column(tables.energeticSpans, 'δE, 2.5 % / kcal mol⁻¹')).toEqual([kcal(dE.low)]);
    expect(column(tables.energeticSpans, 'TOF, 97.5 % / s⁻¹')).toEqual([sig(Math.exp(q(run, 'A/span/tof').high))]);
    expect(column(tables.effectiveBarriers, 'effective barrier ΔG‡, 97.5 % / kcal mol⁻¹')).toEqual(['A', 'th', 'ca'].map((p) => kcal(q(run, `${p}/effectiveBarrier`).high)));
    expect(column(tables.comparisons, 'ΔΔG‡, median / kcal mol⁻¹')).toEqual([kcal(q(run, 'comparison 0/ddG').median)]);
  });

  it('gives the median and 95 % interval of each state\'s X_TOF, in %', () => {
    const pct = (x: number) => Number((100 * x).toPrecision(4));
    expect(column(tables.tofControl, 'X_TOF, median / %')[2]).toBe(pct(q(run, 'A/span/xTof/T3').median));
    expect(column(tables.tofControl, 'X_TOF, 2.5 % / %')[5]).toBe(pct(q(run, 'A/span/xTof/I2').low));
    expect(column(tables.tofControl, 'X_TOF, 97.5 % / %')[5]).toBe(pct(q(run, 'A/span/xTof/I2').high));
  });

  it('gives P(TDTS), P(TDI) and P(candidate faster) as the run counted them', () => {
    const tdts = run.choices.find((c) => c.key === 'A/span/tdts')!.probabilities;
    const rows = tables.uncertainty!.probabilities.rows.filter((r) => r[1] === 'TDTS');
    expect(Object.fromEntries(rows.map((r) => [r[2], r[3]]))).toEqual(Object.fromEntries(Object.entries(tdts).map(([k, p]) => [k, Number((100 * p).toFixed(1))])));
    expect(rows.reduce((s, r) => s + (r[3] as number), 0)).toBeCloseTo(100, 0);
    const faster = run.choices.find((c) => c.key === 'comparison 0/faster')!.probabilities;
    expect(column(tables.comparisons, 'P(candidate faster) / %')).toEqual([Number((100 * (faster.catalysed ?? 0)).toFixed(1))]);
  });

  it('names a unit (or says where it is) in every interval header', () => {
    for (const t of Object.values(tables).filter((x): x is Table => 'columns' in x)) {
      for (const c of t.columns.filter((x) => /, (median|2\.5 %|97\.5 %)/.test(x))) expect(c, c).toMatch(/(\/ (kcal mol⁻¹|s|s⁻¹|%)|\((unit in k (forward|reverse) unit|c° = 1 mol L⁻¹|dimensionless)\))$|^log₁₀ rate ratio/);
    }
  });

  it('keeps the tables without a run exactly as they were: removing the added columns gives them back', () => {
    expect(plain.uncertainty).toBeUndefined();
    for (const key of ['points', 'steps', 'effectiveBarriers', 'energeticSpans', 'comparisons'] as const) {
      const keep = tables[key].columns.map((c, i) => (plain[key].columns.includes(c) ? i : -1)).filter((i) => i >= 0);
      expect(keep.map((i) => tables[key].columns[i])).toEqual(plain[key].columns);
      expect(tables[key].rows.map((r) => keep.map((i) => r[i]))).toEqual(plain[key].rows);
    }
    const md = tablesToMarkdown(plain, 'x');
    expect(md).not.toMatch(/median|Uncertainty|σ|P\(/);
    expect(tablesToCsv(plain)).not.toMatch(/median|Uncertainty|σ/);
  });
});

describe('analysis tables with a Monte Carlo run: selectivity', () => {
  // Invented: two enantiomeric channels 15 and 15.5 kcal/mol from one start, σ 1 kcal/mol each TS.
  const pathway = (id: string, ts: number) => ({ id, name: id, points: [typed('R', 'min', 0), typed('TS', 'ts', ts, { energy: { mode: 'value', value: ts, unit: 'kcal/mol', sigma: 1 } }), typed('P', 'min', -10)] });
  const doc = makeDocument({ pathways: [pathway('S', 15), pathway('R', 15.5)], comparisons: [{ type: 'selectivity', pathways: ['S', 'R'], enantiomeric: true }] });
  const run = analyseUncertainty(doc, { samples: 3000, seed: 2 });
  const tables = tablesOf(doc, run);

  it('gives share and ee intervals and the probability of the major product', () => {
    const ee = q(run, 'comparison 0/ee');
    expect(column(tables.comparisons, 'ee toward the major product, 2.5 % / %')).toEqual([Number((100 * ee.low).toFixed(1))]);
    const s = q(run, 'comparison 0/S/percent');
    expect(column(tables.comparisons, 'product shares, median [95 % interval] / %')[0]).toContain(`S ${s.median.toFixed(1)} [${s.low.toFixed(1)}, ${s.high.toFixed(1)}]`);
    const major = run.choices.find((c) => c.key === 'comparison 0/major')!.probabilities;
    expect(tables.uncertainty!.probabilities.rows).toContainEqual(['selectivity S, R', 'major product', 'S', Number((100 * major.S!).toFixed(1))]);
  });
});
