import { describe, expect, it } from 'vitest';
import { readGaussianLog } from '../../../../core/import/calc/readGaussianLog.ts';
import { imaginaryCount } from '../../../../core/import/calc/calcRecord.ts';
import { qcFixture } from './fixtures.ts';

// Excerpt of cclib's data/Gaussian/basicGaussian16/dvb_ir.out (divinylbenzene, B3LYP/STO-3G
// frequencies, Gaussian 16 A.03); every expected value below is printed in that file.
const LOG = qcFixture('g16-dvb-freq.log');

describe('readGaussianLog', () => {
  it('reads energy, method, charge, multiplicity, geometry and formula of a frequency job', () => {
    const r = readGaussianLog(LOG);
    expect(r).toMatchObject({ program: 'gaussian', version: 'Gaussian 16 A.03', method: 'b3lyp/sto-3g', energyLabel: 'E(RB3LYP)', charge: 0, multiplicity: 1, formula: 'C10H10' });
    expect(r.energyHartree).toBe(-382.308266602);
    expect(r.atoms).toHaveLength(20);
    expect(r.atoms![19]).toEqual({ symbol: 'H', x: 2.364759, y: 0.813041, z: -0 });
  });

  it('reads the 54 harmonic frequencies (3N − 6 for 20 atoms) and counts no imaginary one', () => {
    const r = readGaussianLog(LOG);
    expect(r.frequencies).toHaveLength(54);
    expect(r.frequencies![0]).toBe(53.1981);
    expect(r.frequencies![53]).toBe(3548.332);
    expect(imaginaryCount(r)).toBe(0);
  });

  it('reads the printed thermochemistry with its temperature, pressure and symmetry number', () => {
    const r = readGaussianLog(LOG);
    expect(r.thermo).toEqual({ temperatureK: 298.15, pressureAtm: 1, zpe: 0.177132, eCorrection: 0.186016, hCorrection: 0.18696, gCorrection: 0.143352, entropyModel: 'harmonic' });
    expect(r.symmetryNumber).toBe(2);
    expect(r.termination).toBe('normal');
    expect(r.optimisation).toBe('converged');
    expect(r.missing).toEqual([]);
  });

  it('reads a file cut off in the frequency section as far as it goes and says what is missing', () => {
    const cut = LOG.slice(0, LOG.indexOf(' Frequencies --   1101.5128'));
    const r = readGaussianLog(cut);
    expect(r.energyHartree).toBe(-382.308266602);
    expect(r.frequencies).toHaveLength(24);
    expect(r.thermo).toBeNull();
    expect(r.termination).toBe('truncated');
    expect(r.missing).toEqual(['thermochemistry', 'a termination line (the file ends early)']);
  });

  it('never takes a cut-off orientation block for the geometry', () => {
    const cut = LOG.slice(0, LOG.indexOf('     12          1'));
    const r = readGaussianLog(cut);
    expect(r.atoms).toBeNull();
    expect(r.formula).toBeNull();
    expect(r.missing).toContain('geometry');
    expect(r.notes).toContain('the last orientation block is cut off; the one before it is used');
  });

  it('reports an error termination and a failed convergence test as such', () => {
    const failed = LOG
      .replace(' Maximum Displacement     0.000723     0.001800     YES', ' Maximum Displacement     0.000723     0.000100     NO')
      .replace(/ Optimization completed\.\n {4}-- Stationary point found\.\n/, '')
      .replace(/ Normal termination of Gaussian 16.*\n/, ' Error termination via Lnk1e in l103.exe\n');
    const r = readGaussianLog(failed);
    expect(r.termination).toBe('abnormal');
    expect(r.optimisation).toBe('not-converged');
  });

  it('takes the last job step of a multi-step file, and a step that has not ended makes the file truncated', () => {
    const twoSteps = `${LOG}\n Link1:  Proceeding to internal job step number  2.\n`;
    expect(readGaussianLog(twoSteps).termination).toBe('truncated');
    const second = LOG.replace('SCF Done:  E(RB3LYP) =  -382.308266602', 'SCF Done:  E(RB3LYP) =  -382.400000000');
    const r = readGaussianLog(`${LOG}\n Link1:  Proceeding to internal job step number  2.\n${second.slice(second.indexOf(' SCF Done'))}`);
    expect(r.energyHartree).toBe(-382.4);
    expect(r.termination).toBe('normal');
    expect(r.notes).toContain('2 frequency blocks; the last is used');
  });

  it('reads nothing from text that is not a log, and says so', () => {
    const r = readGaussianLog('hello');
    expect(r.energyHartree).toBeNull();
    expect(r.missing).toContain('final electronic energy (no "SCF Done" line)');
  });
});

describe('readGaussianLog, correlated single point', () => {
  // Excerpt of cclib's data/Gaussian/basicGaussian16/water_ccsdt.log (water, CCSD(T)/STO-3G).
  it('takes the CCSD(T) energy, not the SCF or MP2 one printed before it', () => {
    const r = readGaussianLog(qcFixture('g16-water-ccsdt.log'));
    expect(r).toMatchObject({ method: 'CCSD(T)/STO-3G', energyLabel: 'CCSD(T)', formula: 'H2O', frequencies: null, termination: 'normal', optimisation: 'none' });
    expect(r.energyHartree).toBeCloseTo(-75.017760422, 12);
    expect(r.missing).toEqual(['harmonic frequencies', 'thermochemistry']);
  });

  it('takes MP2 when the run stops after it', () => {
    const text = qcFixture('g16-water-ccsdt.log');
    const r = readGaussianLog(text.slice(0, text.indexOf(' E3=')));
    expect(r.energyLabel).toBe('MP2');
    expect(r.energyHartree).toBeCloseTo(-75.002282127453, 12);
    expect(r.termination).toBe('truncated');
  });
});

describe('readGaussianLog, frequency step followed by a single point', () => {
  it('keeps the last energy and says the thermochemistry came from the earlier step', () => {
    // The real frequency job followed by the real CCSD(T) step (both cclib fixtures, different molecules:
    // only the reading of job steps is tested), joined as Link1 steps.
    const r = readGaussianLog(`${LOG} Link1:  Proceeding to internal job step number  2.\n${qcFixture('g16-water-ccsdt.log')}`);
    expect(r.energyLabel).toBe('CCSD(T)');
    expect(r.method).toBe('CCSD(T)/STO-3G');
    expect(r.notes).toContain('the thermochemistry is from an earlier job step (b3lyp/sto-3g), the energy from the last (CCSD(T)/STO-3G)');
  });
});

describe('readGaussianLog, a transition state', () => {
  // Excerpt of RMG-Py's examples/arkane/reactions/H+C2H4=C2H5/TS_freq.log (MIT License): Gaussian 03 D.01,
  // UB3LYP/6-311G(d,p) frequency job on the H + C2H4 transition state; expected values are printed there.
  const TS = qcFixture('g03-c2h5-ts-freq.log');

  it('reads exactly one imaginary frequency, printed negative, among 3N − 6 = 15 for 7 atoms', () => {
    const r = readGaussianLog(TS);
    expect(r).toMatchObject({ version: 'Gaussian 03 D.01', charge: 0, multiplicity: 2, formula: 'C2H5', energyLabel: 'E(UB+HF-LYP)', termination: 'normal' });
    expect(r.energyHartree).toBe(-79.1166134112);
    expect(r.frequencies).toHaveLength(15);
    expect(r.frequencies![0]).toBe(-757.8102);
    expect(r.frequencies![14]).toBe(3234.209);
    expect(imaginaryCount(r)).toBe(1);
    expect(r.atoms![6]).toEqual({ symbol: 'H', x: 1.816168, y: -1.155271, z: 0 });
    expect(r.thermo).toMatchObject({ temperatureK: 298.15, zpe: 0.052411, hCorrection: 0.056993, gCorrection: 0.028757 });
  });

  it('does not count the high-precision table of IOp(7/33=1) as a second frequency block', () => {
    expect(readGaussianLog(TS).notes.join(' ')).not.toMatch(/frequency blocks/);
  });

  it('says when a frequency job finds its geometry is not a stationary point (its table: Maximum Force 0.004468 > 0.000450, NO)', () => {
    const r = readGaussianLog(TS);
    expect(r.optimisation).toBe('not-converged');
    expect(r.notes.join(' ')).toMatch(/not a stationary point at this level/);
  });
});
