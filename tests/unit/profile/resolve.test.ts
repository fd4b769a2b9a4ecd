import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { parseDocument } from '../../../core/model/load.ts';
import { resolveProfile } from '../../../core/profile/resolve.ts';
import type { ResolvedProfile } from '../../../core/profile/types.ts';
import { convertEnergy } from '../../../core/units/energy.ts';
import { kcalToHartree, onePathway, species, state, typed } from './builders.ts';

const kcal = (j: number | null) => (j === null ? null : convertEnergy(j, 'kJ/mol', 'kcal/mol') / 1000);
const energies = (profile: ResolvedProfile, pathway = 0) => profile.pathways[pathway]!.points.map((p) => kcal(p.energyJ));
const codes = (profile: ResolvedProfile) => profile.findings.map((f) => f.code);
const close = (actual: number | null | undefined, expected: number, rel = 1e-9) =>
  expect(Math.abs((actual ?? Number.NaN) - expected) / Math.abs(expected)).toBeLessThan(rel);

describe('typed and stepwise entry', () => {
  it('resolves typed values, a step from the previous minimum and a barrier above it, cumulatively', () => {
    const doc = onePathway([
      typed('R', 'min', 0),
      { id: 'I', label: 'I', kind: 'min', energy: { mode: 'step', value: -16.736, unit: 'kJ/mol' } },
      { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol' } },
      { id: 'P', label: 'P', kind: 'min', energy: { mode: 'step', value: -10, unit: 'kcal/mol' } },
    ]);
    const profile = resolveProfile(doc);
    const [r, i, t, p] = energies(profile);
    expect(r).toBe(0);
    close(i, -4); // 16.736 kJ = 4 kcal exactly (thermochemical calorie, NIST SP 811)
    close(t, 16);
    close(p, -14); // a step counts from the previous minimum, not from the TS
    expect(profile.pathways[0]!.points[2]!.provenance).toMatchObject({ route: 'barrier', detail: 'barrier 20 kcal mol⁻¹ from I' });
    expect(profile.findings).toEqual([]);
  });

  it('shows typed values as typed under the default document-wide zero', () => {
    // Old code re-zeroed every pathway to its first point: 5, 25, 1 came out as 0, 20, −4.
    const profile = resolveProfile(onePathway([typed('R', 'min', 5), typed('T', 'ts', 25), typed('P', 'min', 1)]));
    expect(energies(profile)).toEqual([5, 25, 1]);
    expect(profile.reference?.kind).toBe('zero');
  });

  it('keeps a format-2 document\'s meaning: each pathway from its own first point, said in a finding', () => {
    const doc = parseDocument(JSON.stringify({ format: 'passline', version: 2, pathways: [{ id: 'a', name: 'A', points: [typed('R', 'min', 5), typed('T', 'ts', 25), typed('P', 'min', 1)] }] }));
    if (!doc.ok) throw new Error('bad doc');
    expect(doc.doc.settings.reference).toEqual({ kind: 'first' });
    const profile = resolveProfile(doc.doc);
    expect(energies(profile)).toEqual([0, 20, -4]);
    expect(codes(profile)).toContain('first-point-rezeroed');
  });

  it('uses a shared reference point across pathways when chosen', () => {
    const doc = parseDocument(JSON.stringify({
      format: 'passline', version: 2,
      settings: { reference: { kind: 'point', pathway: 'b', point: 'S' } },
      pathways: [
        { id: 'a', name: 'A', points: [typed('R', 'min', 2), typed('T', 'ts', 22)] },
        { id: 'b', name: 'B', points: [typed('S', 'min', 1), typed('U', 'ts', 11)] },
      ],
    }));
    if (!doc.ok) throw new Error('fixture');
    const profile = resolveProfile(doc.doc);
    expect(energies(profile, 0)).toEqual([1, 21]);
    expect(energies(profile, 1)).toEqual([0, 10]);
  });

  it('shifting every typed energy by a constant changes no relative value (property)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 3, maxLength: 9 }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), (values, shift) => {
      const build = (offset: number) => onePathway(values.map((v, i) => typed(`p${i}`, i % 2 ? 'ts' : 'min', v + offset)));
      const a = energies(resolveProfile(build(0))), b = energies(resolveProfile(build(shift)));
      return a.every((v, i) => Math.abs((v! - a[0]!) - (b[i]! - b[0]!)) < 1e-7);
    }));
  });
});

describe('species sums', () => {
  it('sums E + G correction over species with counts, relative to the first state', () => {
    const doc = onePathway([state('A+B', 'min', [['A', 1], ['B', 2]]), state('C+B', 'min', [['C', 1], ['B', 1]])], {
      species: [species('A', -1000), species('B', -200), { id: 'C', label: 'C', structures: [{ electronic: kcalToHartree(-1210), gCorrection: kcalToHartree(2), hCorrection: kcalToHartree(4) }] }],
    });
    const [, c] = energies(resolveProfile(doc));
    close(c, -1210 + 2 - (-1000 - 200)); // −8 kcal/mol: one B stays, the other is in C
    const h = energies(resolveProfile({ ...doc, settings: { ...doc.settings, quantity: 'H' } }))[1];
    close(h, -6);
    const e = energies(resolveProfile({ ...doc, settings: { ...doc.settings, quantity: 'E' } }))[1];
    close(e, -10);
  });

  it('reordering species in a state changes nothing (property)', () => {
    const pool = ['A', 'B', 'C', 'D'];
    const doc = (order: string[]) => onePathway([state('R', 'min', [['A', 1], ['B', 1], ['C', 1], ['D', 1]]), state('P', 'min', order.map((s) => [s, 1] as [string, number]))], {
      species: pool.map((id, i) => species(id, -100 * (i + 1) - 0.37 * i)),
    });
    const reference = energies(resolveProfile(doc(pool)))[1]!;
    fc.assert(fc.property(fc.shuffledSubarray(pool, { minLength: 4, maxLength: 4 }), (order) => Math.abs(energies(resolveProfile(doc(order)))[1]! - reference) < 1e-9));
  });

  it('applies the 1 atm → 1 mol/L correction per species, so association energies change', () => {
    // REFERENCE.md §5 (Ben-Naim & Marcus 1984 formula): A + B → AB with ΔG(1 atm) = +5.000 kcal/mol gives 3.105671555 kcal/mol at 1 M, 298.15 K.
    const build = (standardState: '1atm-to-1M' | 'as-computed') => onePathway([state('A+B', 'min', [['A', 1], ['B', 1]]), state('AB', 'min', [['AB', 1]])], {
      settings: { standardState }, species: [species('A', -300), species('B', -400), species('AB', -695)],
    });
    close(energies(resolveProfile(build('as-computed')))[1], 5);
    close(energies(resolveProfile(build('1atm-to-1M')))[1], 3.105671555, 1e-9);
  });

  it('1 bar → 1 mol/L uses RT ln(RTc°/p°) = 1.9021273169 kcal/mol per species at 298.15 K', () => {
    // REFERENCE.md §5, 1 bar row.
    const doc = onePathway([state('AB', 'min', [['AB', 1]]), state('A+B', 'min', [['A', 1], ['B', 1]])], {
      settings: { standardState: '1bar-to-1M' }, species: [species('A', -300), species('B', -400), species('AB', -700)],
    });
    close(energies(resolveProfile(doc))[1], 1.9021273169, 1e-9);
  });

  it('a consumed neat solvent molecule adds −RT ln[S]: +3.000 at 1 M becomes 0.6203535079 kcal/mol at 55.5 M', () => {
    // REFERENCE.md §5 worked check (Bryantsev et al. 2008 convention; 55.5 M is common practice).
    const gas = 3 + 1.89432844549; // A + H2O → B at 1 atm, so that the 1 M value is +3.000
    const doc = (phase: 'solute' | 'solvent') => onePathway([state('A+W', 'min', [['A', 1], ['W', 1]]), state('B', 'min', [['B', 1]])], {
      settings: { standardState: '1atm-to-1M' },
      species: [species('A', -100), species('W', -50, { phase, neatConcentration: 55.5 }), species('B', -150 + gas)],
    });
    close(energies(resolveProfile(doc('solute')))[1], 3, 1e-9);
    close(energies(resolveProfile(doc('solvent')))[1], 0.6203535079, 1e-8);
  });

  it('Boltzmann-weights conformers: G = 0.0, 0.5, 1.2 kcal/mol give G_eff = −0.264218906313', () => {
    // REFERENCE.md §8 Boltzmann check (298.15 K).
    const conformers = [0, 0.5, 1.2].map((g) => ({ electronic: kcalToHartree(-500 + g), gCorrection: 0 }));
    const doc = onePathway([state('ref', 'min', [['X', 1]]), state('ens', 'min', [['Y', 1]])], {
      species: [species('X', -500), { id: 'Y', label: 'Y', structures: conformers }],
    });
    const profile = resolveProfile(doc);
    close(energies(profile)[1], -0.264218906313, 1e-8);
    expect(profile.pathways[0]!.points[1]!.provenance.detail).toContain('3 conformers, populations from G 64.0% / 27.5% / 8.4%');
  });

  it('with quantity H the ensemble enthalpy is Σ pᵢ(G) Hᵢ, populations from G (REFERENCE.md §8 populations)', () => {
    // G = 0.0, 0.5, 1.2 kcal/mol → p = 0.6402155195, 0.2753110573, 0.08447342317 (REFERENCE.md §8);
    // H = 3.0, 1.0, 0.0 kcal/mol → Σ pᵢ Hᵢ computed here by hand from those populations.
    const conformers = [[3, 0], [1, 0.5], [0, 1.2]].map(([h, g]) => ({ electronic: kcalToHartree(-500), hCorrection: kcalToHartree(h!), gCorrection: kcalToHartree(g!) }));
    const doc = onePathway([state('ref', 'min', [['X', 1]]), state('ens', 'min', [['Y', 1]])], {
      settings: { quantity: 'H' },
      species: [species('X', -500), { id: 'Y', label: 'Y', structures: conformers }],
    });
    const profile = resolveProfile(doc);
    close(energies(profile)[1], 3 * 0.6402155195 + 1 * 0.2753110573, 1e-8);
    expect(profile.pathways[0]!.points[1]!.provenance.detail).toContain('populations from G');
    expect(codes(profile)).not.toContain('conformer-weights-not-g');
    const noG = onePathway([state('ref', 'min', [['X', 1]]), state('ens', 'min', [['Y', 1]])], {
      settings: { quantity: 'H' },
      species: [species('X', -500), { id: 'Y', label: 'Y', structures: conformers.map(({ gCorrection: _g, ...c }) => c) }],
    });
    expect(codes(resolveProfile(noG))).toContain('conformer-weights-not-g');
  });

  it('rescales G to another temperature as H − T·S and flags the approximation', () => {
    const sp = (id: string, e: number, h: number, g: number) => ({ id, label: id, correctionTemperatureK: 298.15, structures: [{ electronic: kcalToHartree(e), hCorrection: kcalToHartree(h), gCorrection: kcalToHartree(g) }] });
    // B: H − G = 2.9815 kcal/mol at 298.15 K ⇒ T·S term 0.01 kcal/(mol K); A has no entropy term.
    const doc = onePathway([state('A', 'min', [['A', 1]]), state('B', 'min', [['B', 1]])], { settings: { temperatureK: 398.15 }, species: [sp('A', 0, 1, 1), sp('B', -5, 1, 1 - 2.9815)] });
    const profile = resolveProfile(doc);
    close(energies(profile)[1], -5 - 398.15 * 0.01, 1e-9);
    expect(profile.findings.filter((f) => f.code === 'temperature-mismatch').map((f) => f.severity)).toEqual(['info', 'info']);
  });

  it('a species without the needed data is a finding, not a zero', () => {
    const doc = onePathway([state('A', 'min', [['A', 1]]), state('B', 'min', [['B', 1]])], {
      species: [species('A', 0), { id: 'B', label: 'B', structures: [{ electronic: -1 }] }],
    });
    const profile = resolveProfile(doc);
    expect(energies(profile)[1]).toBeNull();
    expect(profile.findings.find((f) => f.code === 'missing-species-data')?.message).toBe('species "B" has no thermal correction to G, needed for G');
    expect(codes(resolveProfile({ ...doc, settings: { ...doc.settings, quantity: 'E' } }))).toEqual([]);
  });
});

describe('barrier estimates', () => {
  const around = (estimate: object, dG = 10) => onePathway([typed('R', 'min', 0), { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'estimate', estimate } } as never, typed('P', 'min', dG)]);
  const tsEnergy = (estimate: object, dG = 10) => energies(resolveProfile(around(estimate, dG)))[1];

  it('Marcus: λ = 20, ΔG° = +10 kcal/mol gives 11.25 kcal/mol (REFERENCE.md §7, Marcus 1956)', () => {
    close(tsEnergy({ method: 'marcus', lambda: 20, unit: 'kcal/mol' }), 11.25, 1e-12);
  });

  it('Marcus in the inverted region is flagged', () => {
    const profile = resolveProfile(around({ method: 'marcus', lambda: 20, unit: 'kcal/mol' }, -30));
    close(energies(profile)[1], 1.25, 1e-12);
    expect(codes(profile)).toContain('estimate-outside-validity');
  });

  it('Bell–Evans–Polanyi: E₀ = 15, α = 0.40, ΔH = −12 gives 10.2 (REFERENCE.md §7); α outside [0, 1] is flagged', () => {
    close(tsEnergy({ method: 'bep', e0: 15, alpha: 0.4, unit: 'kcal/mol' }, -12), 10.2, 1e-12);
    expect(codes(resolveProfile(around({ method: 'bep', e0: 15, alpha: 1.3, unit: 'kcal/mol' }, -5)))).toContain('estimate-outside-validity');
    // On a G profile the provenance names the step's ΔG, not ΔH, and states the substitution.
    const bep = resolveProfile(around({ method: 'bep', e0: 15, alpha: 0.4, unit: 'kcal/mol' }, -12)).pathways[0]!.points[1]!.provenance;
    expect(bep.detail).toContain('step ΔG =');
    expect(bep.approximations.join(' ')).toContain('in place of ΔH');
  });

  it('inverse Eyring: k = 0.0135881500479 s⁻¹ gives 20.000 kcal/mol; t½ = 1 h gives 22.52199802 (REFERENCE.md §2)', () => {
    close(tsEnergy({ method: 'rateConstant', k: 0.0135881500479 }), 20, 1e-10);
    close(tsEnergy({ method: 'halfLife', seconds: 3600 }), 22.52199802, 1e-9);
  });

  it('Eyring plot: the synthetic ΔH‡ = 18, ΔS‡ = −10 cal/(mol K) data give ΔG‡(298.15 K) = 20.9815 (REFERENCE.md §3)', () => {
    const data = [[278.15, 2.72180346210193e-4], [288.15, 8.72991382477995e-4], [298.15, 0.00259248254739523], [308.15, 0.00718148522001673], [318.15, 0.0186783623365512]]
      .map(([temperatureK, k]) => ({ temperatureK: temperatureK!, k: k! }));
    close(tsEnergy({ method: 'eyringFit', data }), 20.9815, 1e-9);
    // Arrhenius on the same data, H profile: Δ‡H = E_a − RT = 18.590505763712 − 0.592484949714 (REFERENCE.md §3, derived).
    const h = around({ method: 'arrhenius', data });
    close(energies(resolveProfile({ ...h, settings: { ...h.settings, quantity: 'H' } }))[1], 18.590505763712 - 0.592484949714, 1e-9);
  });

  it('an estimate on a minimum, or without a minimum after it, is an error finding', () => {
    const onMin = onePathway([typed('R', 'min', 0), { id: 'X', label: 'X', kind: 'min', energy: { mode: 'estimate', estimate: { method: 'halfLife', seconds: 60 } } }]);
    expect(codes(resolveProfile(onMin))).toContain('estimate-on-minimum');
    const noAfter = onePathway([typed('R', 'min', 0), { id: 'T', label: 'T', kind: 'ts', energy: { mode: 'estimate', estimate: { method: 'marcus', lambda: 20, unit: 'kcal/mol' } } }]);
    expect(resolveProfile(noAfter).findings.find((f) => f.code === 'estimate-failed')?.message).toBe('Marcus estimate needs a minimum after the transition state');
  });
});

describe('Hess route', () => {
  // NIST-JANAF (Chase 1998) 298.15 K values, REFERENCE.md §4: water–gas shift R3.
  const janaf = [
    { id: 'CO', label: 'CO(g)', formula: 'CO', formation: { dfH: -110.527, S: 197.653, dfG: -137.163 } },
    { id: 'H2O', label: 'H2O(g)', formula: 'H2O', formation: { dfH: -241.826, S: 188.834, dfG: -228.582 } },
    { id: 'CO2', label: 'CO2(g)', formula: 'CO2', formation: { dfH: -393.522, S: 213.795, dfG: -394.389 } },
    { id: 'H2', label: 'H2(g)', formula: 'H2', formation: { dfH: 0, S: 130.68, dfG: 0 } },
  ];
  const terms = (...ids: string[]) => ids.map((species) => ({ species, count: 1 }));
  const shift = (quantity: 'G' | 'H') => onePathway([
    { id: 'R', label: 'CO + H2O', kind: 'min', energy: { mode: 'formation', terms: terms('CO', 'H2O') } },
    { id: 'P', label: 'CO2 + H2', kind: 'min', energy: { mode: 'formation', terms: terms('CO2', 'H2') } },
  ], { settings: { quantity, unit: 'kJ/mol' }, species: janaf });

  it('gives ΔrG° = ΔrH° − TΔrS° = −28.6431222 and ΔrH° = −41.169 kJ/mol for CO + H2O → CO2 + H2', () => {
    // REFERENCE.md §4 R3: the ΔrH° − TΔrS° column (ΣνΔfG° = −28.644 differs by table rounding only).
    expect(resolveProfile(shift('G')).pathways[0]!.points[1]!.energyJ! / 1000).toBeCloseTo(-28.6431222, 6);
    expect(resolveProfile(shift('H')).pathways[0]!.points[1]!.energyJ! / 1000).toBeCloseTo(-41.169, 3);
    expect(resolveProfile(shift('G')).findings).toEqual([]);
  });

  it('anchors a pathway\'s end to its Hess value when the start is typed with a composition', () => {
    const doc = onePathway([
      typed('CO + H2O', 'min', 0, { composition: terms('CO', 'H2O') }),
      typed('TS', 'ts', 30),
      { id: 'P', label: 'CO2 + H2', kind: 'min', energy: { mode: 'formation', terms: terms('CO2', 'H2') } },
    ], { settings: { unit: 'kJ/mol' }, species: janaf });
    const profile = resolveProfile(doc);
    expect(profile.pathways[0]!.points[2]!.energyJ! / 1000).toBeCloseTo(-28.6431222, 6); // NIST-JANAF ΔrH° − TΔrS° of R3
    expect(profile.pathways[0]!.points[2]!.provenance.route).toBe('formation');
    expect(profile.findings).toEqual([]);
  });

  it('flags a stepwise pathway whose overall energy disagrees with Hess\'s law', () => {
    const typedRoute = (kJ: number) => onePathway([
      typed('CO + H2O', 'min', 0, { composition: terms('CO', 'H2O') }),
      typed('TS', 'ts', 30),
      { id: 'P', label: 'P', kind: 'min', energy: { mode: 'value', value: kJ, unit: 'kJ/mol' }, composition: terms('CO2', 'H2') },
    ], { species: janaf });
    expect(codes(resolveProfile(typedRoute(-20)))).toContain('hess-mismatch');
    expect(codes(resolveProfile(typedRoute(-28.6)))).not.toContain('hess-mismatch');
  });
});

describe('the demo document', () => {
  it('resolves cleanly: every point has an energy and there are no findings', () => {
    const parsed = parseDocument(readFileSync(new URL('../../../assets/demo/demo.passline', import.meta.url), 'utf8'));
    if (!parsed.ok) throw new Error('demo must load');
    const profile = resolveProfile(parsed.doc);
    expect(profile.findings).toEqual([]);
    expect(profile.pathways.flatMap((p) => p.points).every((p) => p.energyJ !== null)).toBe(true);
  });
});
