import { describe, expect, it } from 'vitest';
import { importCalculations } from '../../../../core/import/calc/importCalculations.ts';
import { speciesKey } from '../../../../core/import/calc/pairCalcFiles.ts';
import { Species } from '../../../../core/model/schema.ts';
import { qcFixture } from './fixtures.ts';

const FREQ = qcFixture('g16-dvb-freq.log');
const ORCA = qcFixture('orca6-dvb-freq.out');
// The ORCA run up to its final energy, before the frequencies: a real single-point text.
const SINGLE_POINT = ORCA.slice(0, ORCA.indexOf('-----------------------\nVIBRATIONAL FREQUENCIES'));
const AT_298 = { temperatureK: 298.15, pressure: '1atm', quasiHarmonic: { method: 'off', cutoffCm1: 100 } } as const;

describe('speciesKey', () => {
  it('drops the folder, the extension and a job tag', () => {
    expect(speciesKey('runs/TS1_freq.log')).toBe('ts1');
    expect(speciesKey('C:\\calc\\int-2.sp.out')).toBe('int-2');
    expect(speciesKey('cat.xyz')).toBe('cat');
  });
});

describe('importCalculations', () => {
  it('makes one species per frequency file, with corrections recomputed at the given T (matching the program at its own T)', () => {
    const result = importCalculations([{ name: 'dvb.log', text: FREQ }], AT_298);
    expect(result.ok).toBe(true);
    const [c] = result.candidates;
    const s = c!.species;
    expect(Species.safeParse(s).success).toBe(true);
    expect(s).toMatchObject({ id: 'dvb', formula: 'C10H10', charge: 0, multiplicity: 1, correctionTemperatureK: 298.15 });
    const st = s.structures[0]!;
    expect(st.electronic).toBe(-382.308266602);
    expect(st.singlePoint).toBeUndefined();
    // Gaussian printed 0.186960 and 0.143352 hartree (cclib dvb_ir.out).
    expect(st.hCorrection).toBeCloseTo(0.18696, 6);
    expect(st.gCorrection).toBeCloseTo(0.143352, 6);
    expect(st.frequencies).toHaveLength(54);
    expect(st.source!.files).toEqual([{ file: 'dvb.log', role: 'energy+corrections', program: 'Gaussian 16 A.03', method: 'b3lyp/sto-3g', termination: 'normal', optimisation: 'converged' }]);
    expect(st.source!.corrections).toContain('recomputed from dvb.log: RRHO at 298.15 K');
    expect(c!.imaginary).toBe(0);
  });

  it('combines a single point with a frequency file: E from one, corrections from the other, both recorded', () => {
    const result = importCalculations([{ name: 'dvb_sp.out', text: SINGLE_POINT }, { name: 'dvb_freq.log', text: FREQ }], { ...AT_298, temperatureK: 350 });
    expect(result.ok).toBe(true);
    expect(result.candidates).toHaveLength(1);
    const st = result.candidates[0]!.species.structures[0]!;
    expect(st.singlePoint).toBe(-382.055107107616);
    expect(st.electronic).toBe(-382.308266602);
    expect(st.source!.files.map((f) => [f.file, f.role, f.method])).toEqual([['dvb_sp.out', 'energy', 'b3lyp sto-3g'], ['dvb_freq.log', 'corrections', 'b3lyp/sto-3g']]);
    expect(result.candidates[0]!.species.correctionTemperatureK).toBe(350);
    // At 350 K the enthalpy correction is larger than Gaussian's printed 298.15 K value.
    expect(st.hCorrection!).toBeGreaterThan(0.18696);
    expect(result.candidates[0]!.warnings).toContain('dvb_sp.out: missing the normal-termination line (the file ends early)');
  });

  it('falls back to the printed corrections, at their temperature, when they cannot be recomputed', () => {
    const noGeometry = FREQ.replace(/ {21,}Standard orientation:[\s\S]*?Rotational constants \(GHZ\): {11}4\.6266363.*\n/, '');
    const [c] = importCalculations([{ name: 'x.log', text: noGeometry }], { ...AT_298, temperatureK: 310 }).candidates;
    expect(c!.species.structures[0]!.hCorrection).toBe(0.18696);
    expect(c!.species.correctionTemperatureK).toBe(298.15);
    expect(c!.species.structures[0]!.source!.corrections).toBe('as printed in x.log at 298.15 K and 1 atm (harmonic)');
  });

  it('is all or nothing: an unreadable file or a file without an energy blocks the import, naming it', () => {
    const result = importCalculations([{ name: 'dvb.log', text: FREQ }, { name: 'notes.txt', text: 'to do' }, { name: 'geom.xyz', text: '1\n\nHe 0 0 0\n' }], AT_298, ['dvb']);
    expect(result.ok).toBe(false);
    expect(result.errors).toEqual(['notes.txt: not a Gaussian log, an ORCA output or an XYZ file', 'geom.xyz: no electronic energy, so it cannot be a species']);
    expect(result.candidates.map((c) => c.species.id)).toEqual(['dvb-2', 'geom']);
  });
});

describe('importing a transition state', () => {
  // RMG-Py's Gaussian 03 frequency job on the H + C2H4 transition state (tests/fixtures/qc/SOURCES.md): one imaginary mode, −757.8102 cm⁻¹.
  const TS = qcFixture('g03-c2h5-ts-freq.log');

  it('counts one imaginary frequency, keeps it with the species and makes it a TS in the added pathway', async () => {
    const { addImportedSpecies } = await import('../../../../core/edit/importedSpecies.ts');
    const { makeDocument } = await import('../../../../core/model/load.ts');
    const result = importCalculations([{ name: 'c2h5.log', text: FREQ }, { name: 'ts1.log', text: TS }], AT_298);
    expect(result.ok).toBe(true);
    const [minimum, ts] = result.candidates;
    expect(minimum!.imaginary).toBe(0);
    expect(ts!.imaginary).toBe(1);
    expect(ts!.species.structures[0]!.frequencies![0]).toBe(-757.8102);
    expect(ts!.species).toMatchObject({ formula: 'C2H5', multiplicity: 2 });
    expect(ts!.warnings.join(' ')).toMatch(/not a stationary point at this level/);
    const doc = addImportedSpecies(makeDocument({ species: [], pathways: [] }), { species: result.candidates.map((c) => c.species), pathwayName: 'H + ethene' });
    expect(doc.pathways[0]!.points.map((p) => p.kind)).toEqual(['min', 'ts']);
  });
});

describe('corrections at another temperature', () => {
  it('are recomputed exactly from the stored frequencies when the document temperature changes', async () => {
    const { makeDocument } = await import('../../../../core/model/load.ts');
    const { resolveProfile } = await import('../../../../core/profile/resolve.ts');
    const at298 = importCalculations([{ name: 'dvb.log', text: FREQ }], AT_298).candidates[0]!.species;
    const at400 = importCalculations([{ name: 'dvb.log', text: FREQ }], { ...AT_298, temperatureK: 400 }).candidates[0]!.species;
    // The absolute G is read as the energy relative to a reference species with G = 0. H − T·S from the
    // 298.15 K corrections would miss it by about 1 millihartree for this molecule at 400 K.
    const zero = { id: 'zero', label: 'zero', structures: [{ electronic: 0, hCorrection: 0, gCorrection: 0 }] };
    const doc = (t: number) => makeDocument({
      settings: { temperatureK: t, quantity: 'G', unit: 'hartree' }, species: [zero, at298],
      pathways: [{ id: 'a', name: 'A', points: [
        { id: 'r', label: 'r', kind: 'min', energy: { mode: 'species', terms: [{ species: 'zero', count: 1 }] } },
        { id: 'p', label: 'p', kind: 'min', energy: { mode: 'species', terms: [{ species: 'dvb', count: 1 }] } },
      ] }],
    });
    const g = (t: number) => resolveProfile(doc(t)).pathways[0]!.points[1]!;
    const expected = at400.structures[0]!.electronic + at400.structures[0]!.gCorrection!;
    const p400 = g(400);
    expect(p400.energyJ! / (4.3597447222071e-18 * 6.02214076e23)).toBeCloseTo(expected, 9);
    expect(p400.provenance.approximations.join(' ')).not.toMatch(/H − T·S|rescal/i);
  });
});
