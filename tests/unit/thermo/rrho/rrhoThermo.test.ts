import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { readGaussianLog } from '../../../../core/import/calc/readGaussianLog.ts';
import { readOrcaOutput } from '../../../../core/import/calc/readOrcaOutput.ts';
import { rrhoThermo, type RrhoInput } from '../../../../core/thermo/rrho/rrhoThermo.ts';
import { qcFixture } from '../../import/calc/fixtures.ts';

const EH = 4.3597447222071e-18 * 6.02214076e23; // J/mol per hartree, CODATA 2018
const CAL = 4.184; // thermochemical calorie (NIST SP 811)
const gaussian = readGaussianLog(qcFixture('g16-dvb-freq.log'));
const orca = readOrcaOutput(qcFixture('orca6-dvb-freq.out'));
const scipyCases = JSON.parse(readFileSync(fileURLToPath(new URL('../../../fixtures/scipy/rrho.json', import.meta.url)), 'utf8')) as {
  cases: { temperatureK: number; pressurePa: number; quasiHarmonic: 'off' | 'grimme' | 'truhlar'; cutoffCm1: number; sTrans: number; sRot: number; sVib: number; zpe: number; uVib: number; enthalpy: number; entropy: number; gibbs: number }[];
};

function run(overrides: Partial<RrhoInput> = {}) {
  const result = rrhoThermo({
    atoms: gaussian.atoms!, frequenciesCm1: gaussian.frequencies!, symmetryNumber: 2, multiplicity: 1,
    temperatureK: 298.15, pressurePa: 101325, masses: 'isotope', quasiHarmonic: { method: 'off', cutoffCm1: 100 }, ...overrides,
  });
  if (!result.ok) throw new Error(result.message);
  return result.value;
}

describe('rrhoThermo', () => {
  it("matches Gaussian 16's own printed thermochemistry for divinylbenzene at 298.15 K, 1 atm", () => {
    const v = run();
    // Printed in cclib's data/Gaussian/basicGaussian16/dvb_ir.out (6 decimals in hartree, 3 in cal/mol/K).
    expect(v.zpe / EH).toBeCloseTo(0.177132, 6);
    expect(v.thermalEnergy / EH).toBeCloseTo(0.186016, 6);
    expect(v.enthalpy / EH).toBeCloseTo(0.18696, 6);
    expect(v.gibbs / EH).toBeCloseTo(0.143352, 6);
    expect(v.entropy / CAL).toBeCloseTo(91.781, 3);
    expect(v.parts.translation.entropy / CAL).toBeCloseTo(40.502, 3);
    expect(v.parts.rotation.entropy / CAL).toBeCloseTo(28.143, 3);
    expect(v.parts.vibration.entropy / CAL).toBeCloseTo(23.136, 3);
  });

  it("matches ORCA 6's printed quasi-RRHO thermochemistry (Grimme, 100 cm⁻¹, standard atomic weights)", () => {
    const result = rrhoThermo({ atoms: orca.atoms!, frequenciesCm1: orca.frequencies!, symmetryNumber: 2, multiplicity: 1, temperatureK: 298.15, pressurePa: 101325, masses: 'standard', quasiHarmonic: { method: 'grimme', cutoffCm1: 100 } });
    if (!result.ok) throw new Error(result.message);
    const v = result.value, t = 298.15;
    // Printed in cclib's data/ORCA/basicORCA6.0/dvb_ir.out; ORCA prints frequencies to 0.01 cm⁻¹,
    // which limits the agreement to a few 10⁻⁷ hartree.
    expect(v.zpe / EH).toBeCloseTo(0.17701463, 6);
    expect((v.parts.vibration.energy - v.zpe) / EH).toBeCloseTo(0.00608063, 6);
    expect(v.parts.rotation.energy / EH).toBeCloseTo(0.00141627, 7);
    expect((t * v.parts.vibration.entropy) / EH).toBeCloseTo(0.01029271, 6);
    expect((t * v.parts.rotation.entropy) / EH).toBeCloseTo(0.01337276, 6);
    expect((t * v.parts.translation.entropy) / EH).toBeCloseTo(0.01924489, 6);
    expect(v.gibbs / EH).toBeCloseTo(0.14396165, 6);
    expect(v.method).toContain("Grimme's quasi-RRHO entropy below 100 cm⁻¹");
  });

  it('agrees with the SciPy partition functions at every temperature, pressure and low-mode treatment', () => {
    expect(scipyCases.cases.length).toBe(12);
    for (const c of scipyCases.cases) {
      const v = run({ temperatureK: c.temperatureK, pressurePa: c.pressurePa, quasiHarmonic: { method: c.quasiHarmonic, cutoffCm1: c.cutoffCm1 } });
      const close = (a: number, b: number) => expect(Math.abs(a - b) / Math.abs(b)).toBeLessThan(1e-9);
      close(v.parts.translation.entropy, c.sTrans);
      close(v.parts.rotation.entropy, c.sRot);
      close(v.parts.vibration.entropy, c.sVib);
      close(v.zpe, c.zpe);
      close(v.parts.vibration.energy, c.uVib);
      close(v.enthalpy, c.enthalpy);
      close(v.gibbs, c.gibbs);
    }
  });

  it('leaves imaginary frequencies out and says so', () => {
    const v = run({ frequenciesCm1: [-420.5, ...gaussian.frequencies!.slice(1)] });
    expect(v.notes).toEqual(['1 imaginary or zero frequency left out of the vibrational terms']);
    expect(v.zpe).toBeLessThan(run().zpe);
  });

  it('treats an atom and a linear molecule with their own rotational terms', () => {
    // Argon at 298.15 K, 1 bar: the Sackur–Tetrode entropy is 154.846 J/(mol K) (NIST-JANAF argon table, S° = 154.845 J/(mol K) at 0.1 MPa, from memory).
    const ar = rrhoThermo({ atoms: [{ symbol: 'Ar', x: 0, y: 0, z: 0 }], frequenciesCm1: [], symmetryNumber: 1, multiplicity: 1, temperatureK: 298.15, pressurePa: 1e5, masses: 'standard', quasiHarmonic: { method: 'off', cutoffCm1: 100 } });
    if (!ar.ok) throw new Error(ar.message);
    expect(ar.value.entropy).toBeCloseTo(154.846, 2);
    expect(ar.value.parts.rotation).toEqual({ entropy: 0, energy: 0 });
    expect(ar.value.notes).toEqual([]);
    // CO at 298.15 K: R(ln(T/θ_rot) + 1) with B from r = 1.128 Å (a geometry of our own) and one mode.
    const co = rrhoThermo({ atoms: [{ symbol: 'C', x: 0, y: 0, z: 0 }, { symbol: 'O', x: 0, y: 0, z: 1.128 }], frequenciesCm1: [2170], symmetryNumber: 1, multiplicity: 1, temperatureK: 298.15, pressurePa: 1e5, masses: 'isotope', quasiHarmonic: { method: 'off', cutoffCm1: 100 } });
    if (!co.ok) throw new Error(co.message);
    expect(co.value.parts.rotation.energy).toBeCloseTo(8.314462618 * 298.15, 3);
    expect(co.value.notes).toEqual([]);
  });

  it('refuses an element without a mass, naming it', () => {
    expect(rrhoThermo({ atoms: [{ symbol: 'Og', x: 0, y: 0, z: 0 }], frequenciesCm1: [], symmetryNumber: 1, multiplicity: 1, temperatureK: 298.15, pressurePa: 1e5, masses: 'isotope', quasiHarmonic: { method: 'off', cutoffCm1: 100 } }))
      .toEqual({ ok: false, message: 'no atomic mass for Og' });
  });
});
