import { describe, expect, it } from 'vitest';
import { readOrcaOutput } from '../../../../core/import/calc/readOrcaOutput.ts';
import { qcFixture } from './fixtures.ts';

// Excerpt of cclib's data/ORCA/basicORCA6.0/dvb_ir.out (divinylbenzene, B3LYP/STO-3G
// frequencies, ORCA 6.0.1); every expected value below is printed in that file.
const OUT = qcFixture('orca6-dvb-freq.out');

describe('readOrcaOutput', () => {
  it('reads energy, keyword level, charge, multiplicity, geometry and formula', () => {
    const r = readOrcaOutput(OUT);
    expect(r).toMatchObject({ program: 'orca', version: 'ORCA 6.0.1', method: 'b3lyp sto-3g', charge: 0, multiplicity: 1, formula: 'C10H10' });
    expect(r.energyHartree).toBe(-382.055107107616);
    expect(r.atoms).toHaveLength(20);
  });

  it('drops the six zero modes and keeps 54 vibrations', () => {
    const r = readOrcaOutput(OUT);
    expect(r.frequencies).toHaveLength(54);
    expect(r.frequencies![0]).toBe(43.87);
    expect(r.frequencies![53]).toBe(3546.41);
  });

  it('reads the printed thermochemistry, its entropy model and the symmetry number', () => {
    const r = readOrcaOutput(OUT);
    expect(r.thermo).toMatchObject({ temperatureK: 298.15, pressureAtm: 1, zpe: 0.17701463, eCorrection: 0.18592781, gCorrection: 0.14396165, entropyModel: 'Grimme quasi-RRHO entropy, 100 cm⁻¹' });
    expect(r.thermo!.hCorrection).toBeCloseTo(0.18592781 + 0.00094421, 12);
    expect(r.symmetryNumber).toBe(2);
    expect(r.termination).toBe('normal');
    expect(r.optimisation).toBe('none');
    expect(r.missing).toEqual([]);
  });

  it('reads a file cut off before the frequencies as a single point that did not finish', () => {
    const r = readOrcaOutput(OUT.slice(0, OUT.indexOf('VIBRATIONAL FREQUENCIES')));
    expect(r.energyHartree).toBe(-382.055107107616);
    expect(r.frequencies).toBeNull();
    expect(r.thermo).toBeNull();
    expect(r.termination).toBe('truncated');
    expect(r.missing).toEqual(['harmonic frequencies', 'thermochemistry', 'the normal-termination line (the file ends early)']);
  });

  it('treats an optimisation keyword without the convergence banner as not converged', () => {
    const r = readOrcaOutput(OUT.replace('!  b3lyp sto-3g usesym freq', '!  b3lyp sto-3g opt freq'));
    expect(r.optimisation).toBe('not-converged');
    expect(r.method).toBe('b3lyp sto-3g');
  });
});

describe('readOrcaOutput, a real geometry optimisation', () => {
  // Excerpt of cclib's data/ORCA/basicORCA6.0/dvb_gopt.out (divinylbenzene, B3LYP/STO-3G, ORCA 6.0.0,
  // converged after 3 cycles); every expected value below is printed in that file.
  const GOPT = qcFixture('orca6-dvb-gopt.out');

  it('reads the run as converged, with the last printed energy and the optimised geometry', () => {
    const r = readOrcaOutput(GOPT);
    expect(r).toMatchObject({ version: 'ORCA 6.0.0', charge: 0, multiplicity: 1, formula: 'C10H10', termination: 'normal', optimisation: 'converged' });
    // The energy of the final evaluation at the stationary point, not the -382.055133025246 of the last cycle before it.
    expect(r.energyHartree).toBe(-382.055133399486);
    // The final block's first atom; the cycle-1 (input) geometry starts with C -1.415253 0.230222.
    expect(r.atoms).toHaveLength(20);
    expect(r.atoms![0]).toEqual({ symbol: 'C', x: -1.417709, y: 0.228462, z: 0 });
    expect(r.atoms![19]).toEqual({ symbol: 'H', x: -4.934323, y: -0.067378, z: 0 });
  });

  it('reads the same run cut before the convergence banner (cut here, in the test) as not converged and unfinished', () => {
    const cut = GOPT.slice(0, GOPT.indexOf('                    ***********************HURRAY'));
    const r = readOrcaOutput(cut);
    expect(r.optimisation).toBe('not-converged');
    expect(r.termination).toBe('truncated');
    expect(r.energyHartree).toBe(-382.055133025246);
    expect(r.atoms![0]).toEqual({ symbol: 'C', x: -1.415253, y: 0.230222, z: 0 });
  });
});
