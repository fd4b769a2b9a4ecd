import { describe, expect, it } from 'vitest';
import type { CalcAtom } from '../../../../core/import/calc/calcRecord.ts';
import { geometryDeviation, SAME_GEOMETRY_TOLERANCE_A } from '../../../../core/import/calc/geometryDeviation.ts';
import { importCalculations } from '../../../../core/import/calc/importCalculations.ts';
import { pairCalcFiles, type CalcFile } from '../../../../core/import/calc/pairCalcFiles.ts';
import { readCalculation } from '../../../../core/import/calc/readCalculation.ts';
import { qcFixture } from './fixtures.ts';

// Real fixtures (tests/fixtures/qc/SOURCES.md): ORCA 6 single point and frequency job of
// divinylbenzene at the same input geometry (cclib dvb_sp.out, dvb_ir.out), and Gaussian 16's
// frequency job on its own optimised geometry of the same molecule (cclib dvb_ir.out).
const SP_TEXT = qcFixture('orca6-dvb-sp.out');
const FREQ_TEXT = qcFixture('orca6-dvb-freq.out');
const G16_FREQ_TEXT = qcFixture('g16-dvb-freq.log');
const AT_298 = { temperatureK: 298.15, pressure: '1atm', quasiHarmonic: { method: 'off', cutoffCm1: 100 } } as const;

function file(name: string, text: string): CalcFile {
  const read = readCalculation(text, name);
  if (!read.ok) throw new Error(read.message);
  return { name, record: read.record };
}

/** The geometry turned about a tilted axis and moved, then rounded to 1e-6 Å as a program prints it (made in the test). */
function rotated(atoms: readonly CalcAtom[]): CalcAtom[] {
  const [ux, uy, uz] = [1, 2, 3].map((v) => v / Math.hypot(1, 2, 3)) as [number, number, number];
  const t = 1.1; // radians
  const c = Math.cos(t);
  const s = Math.sin(t);
  const round = (v: number) => Math.round(v * 1e6) / 1e6;
  // Rodrigues' rotation formula.
  return atoms.map(({ symbol, x, y, z }) => {
    const dot = ux * x + uy * y + uz * z;
    const cross = [uy * z - uz * y, uz * x - ux * z, ux * y - uy * x] as const;
    return {
      symbol,
      x: round(x * c + cross[0] * s + ux * dot * (1 - c) + 0.7),
      y: round(y * c + cross[1] * s + uy * dot * (1 - c) - 2.1),
      z: round(z * c + cross[2] * s + uz * dot * (1 - c) + 0.4),
    };
  });
}

const withAtoms = (f: CalcFile, name: string, atoms: CalcAtom[]): CalcFile => ({ name, record: { ...f.record, atoms } });

describe('geometryDeviation', () => {
  const atoms = file('f.out', FREQ_TEXT).record.atoms!;

  it('is zero for the same geometry and stays below rounding for a rotated, moved and reordered copy', () => {
    expect(geometryDeviation(atoms, atoms)).toBe(0);
    const copy = rotated(atoms).reverse();
    expect(geometryDeviation(atoms, copy)!).toBeLessThan(1e-5);
  });

  it('sees one C–H bond stretched by 0.05 Å (made in the test) as far beyond the tolerance', () => {
    const [c, h] = [atoms[2]!, atoms[6]!]; // C3 and its H7, 1.0987 Å apart in the file
    const d = Math.hypot(h.x - c.x, h.y - c.y, h.z - c.z);
    const k = 0.05 / d;
    const stretched = atoms.map((a, i) => (i === 6 ? { ...a, x: a.x + (h.x - c.x) * k, y: a.y + (h.y - c.y) * k, z: a.z + (h.z - c.z) * k } : a));
    // Sorted lists compare the stretched bond with its neighbour in length, so the deviation is a lower bound
    // on the change (0.0477 Å here), still 47 times the tolerance.
    expect(geometryDeviation(atoms, stretched)!).toBeGreaterThan(0.04);
    expect(geometryDeviation(atoms, stretched)!).toBeLessThanOrEqual(0.05 + 1e-9);
  });

  it('is null for different atoms, even with no distances to compare', () => {
    expect(geometryDeviation([{ symbol: 'He', x: 0, y: 0, z: 0 }], [{ symbol: 'Ne', x: 0, y: 0, z: 0 }])).toBeNull();
    expect(geometryDeviation(atoms, atoms.slice(1))).toBeNull();
  });

  it('tells two separate optimisations of the same molecule apart (Gaussian 16 vs ORCA 6 divinylbenzene: 0.014 Å)', () => {
    const g16 = file('g.log', G16_FREQ_TEXT).record.atoms!;
    expect(geometryDeviation(atoms, g16)!).toBeCloseTo(0.0139, 3);
    expect(geometryDeviation(atoms, g16)!).toBeGreaterThan(SAME_GEOMETRY_TOLERANCE_A);
  });
});

describe('pairCalcFiles', () => {
  const sp = file('dvb_sp.out', SP_TEXT);
  const freq = file('dvb_freq.out', FREQ_TEXT);

  it('still pairs by name first, with no note', () => {
    const pairs = pairCalcFiles([sp, freq]);
    expect(pairs).toEqual([{ energy: sp, corrections: freq, notes: [] }]);
  });

  it('pairs a single point and a frequency file whose names do not pair, when the geometry is the same (real files, same orientation)', () => {
    const a = { ...sp, name: 'level2-energy-run.out' };
    const b = { ...freq, name: 'hessian-b3lyp.out' };
    const pairs = pairCalcFiles([a, b]);
    expect(pairs).toHaveLength(1);
    expect(pairs[0]!.energy).toBe(a);
    expect(pairs[0]!.corrections).toBe(b);
    expect(pairs[0]!.notes).toEqual(['level2-energy-run.out and hessian-b3lyp.out paired by geometry (names differ): same formula, charge and multiplicity, and every interatomic distance agrees within 0.001 Å (largest difference 0.000000 Å)']);
  });

  it('pairs whatever the orientation: a rotated copy of the real geometry (made in the test)', () => {
    const turned = withAtoms(freq, 'hessian.out', rotated(freq.record.atoms!));
    const pairs = pairCalcFiles([{ ...sp, name: 'energy.out' }, turned]);
    expect(pairs).toHaveLength(1);
    expect(pairs[0]!.corrections).toBe(turned);
  });

  it('does not pair a near miss: one C–H bond 0.05 Å longer (made in the test)', () => {
    const atoms = freq.record.atoms!;
    const [c, h] = [atoms[2]!, atoms[6]!];
    const k = 0.05 / Math.hypot(h.x - c.x, h.y - c.y, h.z - c.z);
    const moved = atoms.map((a, i) => (i === 6 ? { ...a, x: a.x + (h.x - c.x) * k, y: a.y + (h.y - c.y) * k, z: a.z + (h.z - c.z) * k } : a));
    const pairs = pairCalcFiles([{ ...sp, name: 'energy.out' }, withAtoms(freq, 'hessian.out', moved)]);
    expect(pairs).toHaveLength(2);
    expect(pairs.every((p) => p.notes.length === 0)).toBe(true);
  });

  it('does not pair the same molecule optimised separately by two programs (real files, 0.014 Å apart)', () => {
    const pairs = pairCalcFiles([{ ...sp, name: 'energy.out' }, file('gaussian-hessian.log', G16_FREQ_TEXT)]);
    expect(pairs.map((p) => [p.energy.name, p.corrections?.name ?? null])).toEqual([['energy.out', null], ['gaussian-hessian.log', 'gaussian-hessian.log']]);
  });

  it('does not pair across charge and multiplicity (the single point\'s input line changed to "* xyz 1 2" in the test)', () => {
    const cation = file('energy.out', SP_TEXT.replace('| 11> * xyz 0 1', '| 11> * xyz 1 2'));
    expect(pairCalcFiles([cation, { ...freq, name: 'hessian.out' }])).toHaveLength(2);
  });

  it('leaves an ambiguous case apart with a note: one single point, two frequency files at that geometry', () => {
    const a = { ...sp, name: 'energy.out' };
    const f1 = { ...freq, name: 'hessian-1.out' };
    const f2 = withAtoms(freq, 'hessian-2.out', rotated(freq.record.atoms!));
    const pairs = pairCalcFiles([a, f1, f2]);
    expect(pairs.map((p) => [p.energy.name, p.corrections?.name ?? null])).toEqual([['energy.out', null], ['hessian-1.out', 'hessian-1.out'], ['hessian-2.out', 'hessian-2.out']]);
    expect(pairs[0]!.notes).toEqual(['energy.out: not paired, the geometry matches hessian-1.out and hessian-2.out; rename the two that belong together (e.g. x_sp / x_freq) to pair them']);
    expect(pairs[1]!.notes).toEqual(['hessian-1.out: not paired, the geometry matches energy.out and a choice is not made for you']);
  });

  it('leaves an ambiguous case apart with a note: two single points, one frequency file at that geometry', () => {
    const e1 = { ...sp, name: 'energy-a.out' };
    const e2 = { ...sp, name: 'energy-b.out' };
    const f = { ...freq, name: 'hessian.out' };
    const pairs = pairCalcFiles([e1, e2, f]);
    expect(pairs.every((p) => p.corrections === null || p.corrections === p.energy)).toBe(true);
    expect(pairs[0]!.notes).toEqual(['energy-a.out: not paired with hessian.out, whose geometry also matches energy-b.out; rename the two that belong together (e.g. x_sp / x_freq) to pair them']);
    expect(pairs[2]!.notes).toEqual(['hessian.out: not paired, the geometry matches energy-a.out and energy-b.out and a choice is not made for you']);
  });
});

describe('importCalculations, pairing by geometry', () => {
  it('takes E from the single point and the corrections from the frequency file, and shows the note with the species', () => {
    const result = importCalculations([{ name: 'b3lyp-energy.out', text: SP_TEXT }, { name: 'hessian.out', text: FREQ_TEXT }], AT_298);
    expect(result.ok).toBe(true);
    expect(result.candidates).toHaveLength(1);
    const c = result.candidates[0]!;
    const st = c.species.structures[0]!;
    // Both energies as printed: dvb_sp.out's FINAL SINGLE POINT ENERGY, then dvb_ir.out's.
    expect(st.singlePoint).toBe(-382.055108392562);
    expect(st.electronic).toBe(-382.055107107616);
    expect(st.source!.files.map((f) => [f.file, f.role])).toEqual([['b3lyp-energy.out', 'energy'], ['hessian.out', 'corrections']]);
    expect(c.warnings[0]).toMatch(/^b3lyp-energy\.out and hessian\.out paired by geometry/);
  });
});
