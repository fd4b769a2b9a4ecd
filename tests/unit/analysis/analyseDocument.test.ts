import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { parseDocument } from '../../../core/model/load.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';
import { onePathway, species, state, typed } from '../profile/builders.ts';

const close = (actual: number | null | undefined, expected: number, rel = 1e-9) =>
  expect(Math.abs((actual ?? Number.NaN) - expected) / Math.abs(expected)).toBeLessThan(rel);

describe('analyseDocument', () => {
  it('bimolecular step from compositions: A + B → [AB]‡ at 1 M gives k = 0.3324395764 L mol⁻¹ s⁻¹', () => {
    // REFERENCE.md §5 worked check: Δ‡G(1 atm) = 20.000 kcal/mol → 18.10567155 at 1 mol/L; k = (k_BT/h)/c° · exp(−Δ‡G/RT).
    const doc = onePathway([
      state('A + B', 'min', [['A', 1], ['B', 1]]),
      state('TS', 'ts', [['TS', 1]]),
      state('AB', 'min', [['AB', 1]]),
    ], { settings: { standardState: '1atm-to-1M' }, species: [species('A', -300), species('B', -400), species('TS', -680), species('AB', -710)] });
    const [step] = analyseDocument(doc).pathways[0]!.steps;
    close(step!.barrierForwardJ! / 4184, 18.10567155, 1e-9);
    expect(step).toMatchObject({ molecularityForward: 2, molecularityReverse: 1, unitForward: 'M⁻¹ s⁻¹', unitReverse: 's⁻¹' });
    close(step!.kForward, 0.3324395764, 1e-9);
  });

  it('cycle A of the energetic span sheet: TOF, TDTS and TDI in the report contract', () => {
    // REFERENCE.md §6, cycle A (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011); steady state by SciPy and mpmath).
    const labels = [['I1', 'min', 0], ['T1', 'ts', 12], ['I2', 'min', -6], ['T2', 'ts', 15], ['I3', 'min', -4.5], ['T3', 'ts', 16.5], ['I4', 'min', -3], ['T4', 'ts', 8], ['I1′', 'min', -2]] as const;
    const doc = onePathway(labels.map(([id, kind, v]) => typed(id, kind, v)), {}, true);
    const report = analysisReport(doc, analyseDocument(doc));
    const span = report.pathways[0]!.energeticSpan!;
    close(span.tof, 1.66434592407551e-4, 1e-9);
    close(span.deltaE, 22.5, 1e-12);
    expect([span.tdts, span.tdi]).toEqual(['T3', 'I2']);
    close(span.degreeOfTofControl.T3, 0.9311988761, 1e-8);
    close(span.degreeOfTofControl.I2, 0.9309932243, 1e-8);
    expect(report.pathways[0]!.steps).toHaveLength(4);
    // Eyring k⁺ of the first step, REFERENCE.md §6 list: 9.9357585046e+03 s⁻¹.
    close(report.pathways[0]!.steps[0]!.kForward, 9.9357585046e3, 1e-9);
  });

  it('the demo: contract fields, catalysed vs thermal rate ratio exp(ΔΔG‡/RT)', () => {
    const parsed = parseDocument(readFileSync(new URL('../../../assets/demo/demo.passline', import.meta.url), 'utf8'));
    if (!parsed.ok) throw new Error('demo must load');
    const report = analysisReport(parsed.doc, analyseDocument(parsed.doc));
    // Issue 12 added reference and standardState; the earlier keys keep their order and meaning.
    expect(Object.keys(report)).toEqual(['title', 'quantity', 'unit', 'temperatureK', 'reference', 'standardState', 'pathways', 'comparisons', 'checks']);
    expect(Object.keys(report.pathways[0]!)).toEqual(expect.arrayContaining(['name', 'cycle', 'points', 'steps', 'effectiveBarrier', 'energeticSpan']));
    expect(Object.keys(report.pathways[0]!.steps[0]!)).toEqual(expect.arrayContaining(['from', 'ts', 'to', 'barrierForward', 'barrierReverse', 'reactionEnergy', 'kForward', 'kReverse', 'halfLifeSeconds']));
    const [rate] = report.comparisons;
    expect(rate).toMatchObject({ type: 'rate', baseline: 'Thermal', candidate: 'Catalysed (LA)' });
    if (rate?.type !== 'rate') throw new Error('rate comparison expected');
    close(rate.ddG, 10.7, 1e-12);
    // exp(ΔΔG‡/RT) with RT = 0.592484949713764 kcal/mol at 298.15 K (REFERENCE.md §1, exact constants).
    close(rate.rateRatio, Math.exp(10.7 / 0.592484949713764), 1e-9);
    expect(report.checks).toEqual([]);
  });

  it('selectivity between competing pathways: 1.0 kcal/mol apart gives 84.39354867 % and ee 68.78709734 %', () => {
    // REFERENCE.md §8 forward check (Curtin–Hammett, IUPAC Gold Book), 298.15 K.
    const parsed = parseDocument(JSON.stringify({
      format: 'passline', version: 2,
      pathways: [
        { id: 're', name: 'Re face', points: [typed('S', 'min', 0), typed('TS-re', 'ts', 14), typed('P-R', 'min', -8)] },
        { id: 'si', name: 'Si face', points: [typed('S', 'min', 0), typed('TS-si', 'ts', 15), typed('P-S', 'min', -8)] },
      ],
      comparisons: [{ type: 'selectivity', pathways: ['re', 'si'], enantiomeric: true }],
    }));
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const [sel] = analysisReport(parsed.doc, analyseDocument(parsed.doc)).comparisons;
    if (sel?.type !== 'selectivity') throw new Error('selectivity expected');
    close(sel.products[0]!.percent, 84.39354867, 1e-9);
    close(sel.ee, 0.6878709734, 1e-9);
    close(sel.ratio, 5.407606565, 1e-9);
  });

  it('a strongly exergonic pathway carries the safety caution', () => {
    const doc = onePathway([typed('R', 'min', 0), typed('T', 'ts', 10), typed('P', 'min', -40)]);
    const caution = analyseDocument(doc).findings.find((f) => f.code === 'safety-caution');
    expect(caution?.message).toContain('not a process-safety assessment');
    expect(analyseDocument(onePathway([typed('R', 'min', 0), typed('T', 'ts', 10), typed('P', 'min', -20)])).findings).toEqual([]);
  });

  it('an E or H profile says that rates treat Δ‡E or Δ‡H as Δ‡G; findings are not reported twice', () => {
    const doc = onePathway([typed('R', 'min', 0), typed('T', 'ts', -1), typed('P', 'min', -3)], { settings: { quantity: 'H' } });
    const findings = analyseDocument(doc).findings;
    expect(findings.map((f) => f.code).filter((c) => c === 'ts-below-neighbour')).toHaveLength(1);
    expect(findings.map((f) => f.code)).toContain('rates-need-g');
  });

  it('the species demo: mass-balanced, standard-state corrected, bimolecular steps flagged as diffusion-controlled', () => {
    const parsed = parseDocument(readFileSync(new URL('../../../assets/demo/species-demo.passline', import.meta.url), 'utf8'));
    if (!parsed.ok) throw new Error('species demo must load');
    const analysis = analyseDocument(parsed.doc);
    expect(analysis.findings.map((f) => f.code)).toEqual(['faster-than-diffusion', 'faster-than-diffusion']);
    // Printed the way the app prints numbers: "1.51 × 10¹² M⁻¹ s⁻¹", not "1.51e+12".
    expect(analysis.findings[0]!.message).toMatch(/ is \d\.\d\d × 10[¹²³⁴⁵⁶⁷⁸⁹⁰]+ M⁻¹ s⁻¹ \(c° = 1 mol\/L\), above the diffusion limit/);
    const [bind] = analysis.pathways[0]!.steps;
    expect(bind).toMatchObject({ barrierless: true, molecularityForward: 2, unitForward: 'M⁻¹ s⁻¹' });
  });
});

describe('analyze wording (issue 12)', () => {
  it('names the raised barrier k uses, ΔH‡ on an H profile with the estimate caveat, and the standard state', async () => {
    const { analysisReport } = await import('../../../core/report/analysisReport.ts');
    const { analysisText } = await import('../../../core/report/analysisText.ts');
    const { makeDocument: make } = await import('../../../core/model/load.ts');
    const doc = make({
      settings: { quantity: 'H' },
      pathways: [{ id: 'a', name: 'A', points: [
        { id: 'R', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
        { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'value', value: 11.4, unit: 'kcal/mol' } },
        { id: 'P', label: 'P', kind: 'min', energy: { mode: 'value', value: 12.2, unit: 'kcal/mol' } },
      ] }],
    });
    const report = analysisReport(doc, analyseDocument(doc));
    expect(report.pathways[0]!.steps[0]!.barrierUsed).toBeCloseTo(12.2, 9);
    expect(report.pathways[0]!.effectiveBarrier).toMatchObject({ tsRaised: true });
    expect(report.reference.kind).toBe('zero');
    const text = analysisText(report);
    expect(text).toContain('ΔH‡ +12.2*');
    expect(text).toContain('k uses +12.2: TS raised');
    expect(text).toContain('rates below are estimates');
    expect(text).not.toContain('ΔG‡ +');
  });
});

describe('faster-than-diffusion finding', () => {
  const comp = (...ids: string[]) => ({ composition: ids.map((s) => ({ species: s, count: 1 })) });
  const declared = ['A', 'B', 'C', 'TS', 'P'].map((id) => ({ id, label: id }));
  // Eyring at Δ‡G = 2.0 kcal/mol, 298.15 K, CODATA 2018 k_B, h, R: (k_BT/h)·exp(−8368/RT) = 2.1246 × 10¹¹ L mol⁻¹ s⁻¹ (worked by hand).
  const doc = (reactants: string[], standardState: 'as-computed' | '1atm-to-1M') => onePathway([
    typed('R', 'min', 0, comp(...reactants)), typed('TS', 'ts', 2, comp('TS')), typed('P', 'min', -30, comp('P')),
  ], { species: declared, settings: { standardState } });

  it('quotes a bimolecular k in M⁻¹ s⁻¹ with its standard state', () => {
    const [f, ...rest] = analyseDocument(doc(['A', 'B'], '1atm-to-1M')).findings.filter((x) => x.code === 'faster-than-diffusion');
    expect(rest).toEqual([]);
    expect(f!.message).toContain('is 2.12 × 10¹¹ M⁻¹ s⁻¹ (c° = 1 mol/L), above the diffusion limit');
    const asComputed = analyseDocument(doc(['A', 'B'], 'as-computed')).findings.find((x) => x.code === 'faster-than-diffusion');
    expect(asComputed!.message).toContain('M⁻¹ s⁻¹ (standard state of the input energies, taken as c° = 1 mol/L)');
  });

  it('does not apply the bimolecular diffusion limit to a termolecular step (common practice: encounter control is two-body)', () => {
    const analysis = analyseDocument(doc(['A', 'B', 'C'], '1atm-to-1M'));
    expect(analysis.pathways[0]!.steps[0]).toMatchObject({ molecularityForward: 3, unitForward: 'M⁻² s⁻¹' });
    expect(analysis.pathways[0]!.steps[0]!.kForward!).toBeGreaterThan(1e10);
    expect(analysis.findings.map((x) => x.code)).not.toContain('faster-than-diffusion');
  });
});
