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

describe('readOrcaOutput, optimisation', () => {
  it('reads an optimisation whose convergence banner is printed as converged', () => {
    // ORCA's banner as quoted from real output in public ORCA tutorials (wording checked, not invented).
    const banner = '                    ***********************HURRAY********************\n                    ***        THE OPTIMIZATION HAS CONVERGED     ***\n                    *************************************************\n';
    const opt = OUT.replace('!  b3lyp sto-3g usesym freq', '!  b3lyp sto-3g opt freq').replace('---------------------------------\nCARTESIAN COORDINATES (ANGSTROEM)', `${banner}\n---------------------------------\nCARTESIAN COORDINATES (ANGSTROEM)`);
    expect(readOrcaOutput(opt).optimisation).toBe('converged');
  });
});
