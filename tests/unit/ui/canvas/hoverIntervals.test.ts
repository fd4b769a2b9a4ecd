import { describe, expect, it } from 'vitest';
import { analyseDocument } from '../../../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../../../core/model/load.ts';
import { analyseUncertainty } from '../../../../core/uncertainty/uncertaintyRun.ts';
import { rtJoules } from '../../../../core/units/thermal.ts';
import { pointSummary } from '../../../../ui/canvas/pointSummary.ts';
import { stepSummary } from '../../../../ui/canvas/stepSummary.ts';

// An invented A → TS → B route whose barrier (20 kcal/mol) carries σ = 1 kcal/mol. The TS energy is
// normal, so its 95 % interval is 20 ∓ 1.959964 × 1 (normal quantiles), and k is log-normal with
// percentiles k₀·exp(∓1.959964 σ/RT) (Eyring–Polanyi). 1 kcal = 4184 J (NIST SP 811).
const doc = makeDocument({
  pathways: [{
    id: 'p', name: 'Route', points: [
      { id: 'a', label: 'A', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
      { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol', sigma: 1 } },
      { id: 'b', label: 'B', kind: 'min', energy: { mode: 'value', value: -5, unit: 'kcal/mol' } },
    ],
  }],
});
const analysis = analyseDocument(doc);
const run = analyseUncertainty(doc, { samples: 20000, seed: 5 });
const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';
/** "1.234 × 10⁻⁵" (formatScientific) or "18.0" → number. */
const read = (t: string) => Number(t.replace(/\s*×\s*10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/, (_, e: string) => `e${[...e].map((c) => (c === '⁻' ? '-' : String(SUPERSCRIPT.indexOf(c)))).join('')}`));
/** The two ends of "95 %: LOW to HIGH" after `after`. */
const ends = (text: string, after: string) => {
  const m = new RegExp(`${after}95 %: (.+?) to (.+?)(?: kcal| s⁻¹)`).exec(text);
  if (!m) throw new Error(`no interval after "${after}" in ${text}`);
  return [read(m[1]!), read(m[2]!)] as const;
};

describe('hover texts carry the 95 % interval of a finished run', () => {
  it('gives a level its energy interval with N and seed', () => {
    const s = pointSummary(analysis.profile, 'p', 't', 'kcal/mol', 1, run)!;
    expect(s.interval).toMatch(/^95 %: \d+\.\d to \d+\.\d kcal mol⁻¹ \(Monte Carlo, N = 20000, seed 5\)$/);
    const [low, high] = ends(s.interval!, '');
    expect(low).toBeCloseTo(20 - 1.959964, 0);
    expect(high).toBeCloseTo(20 + 1.959964, 0);
  });

  it('says nothing where no σ reaches the level, or without a run', () => {
    expect(pointSummary(analysis.profile, 'p', 'a', 'kcal/mol', 1, run)!.interval).toBeNull();
    expect(pointSummary(analysis.profile, 'p', 't', 'kcal/mol', 1)!.interval).toBeNull();
  });

  it('gives a step its barrier and k intervals', () => {
    const text = stepSummary(analysis, 'p', 'a', 't', 'kcal/mol', 1, run)!;
    expect(text).toContain('ΔG‡ forward 95 %:');
    const [kLow, kHigh] = ends(text, 'k forward ');
    const k0 = analysis.pathways[0]!.steps[0]!.kForward!;
    const factor = Math.exp((1.959964 * 4184) / rtJoules(298.15));
    // formatScientific shows 3–4 significant digits; the Monte Carlo percentile is within ~5 % at N = 20 000.
    expect(kLow / (k0 / factor)).toBeCloseTo(1, 1);
    expect(kHigh / (k0 * factor)).toBeCloseTo(1, 1);
    expect(stepSummary(analysis, 'p', 'a', 't', 'kcal/mol', 1)).not.toContain('95 %');
  });
});
