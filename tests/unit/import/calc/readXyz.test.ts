import { describe, expect, it } from 'vitest';
import { readXyz } from '../../../../core/import/calc/readXyz.ts';
import { readCalculation } from '../../../../core/import/calc/readCalculation.ts';
import { qcFixture } from './fixtures.ts';

describe('readXyz', () => {
  it('reads the last frame of a trajectory and gives its Hill formula', () => {
    // Water, a geometry of our own (not from any file).
    const text = '3\nfirst\nO 0 0 0\nH 0 0.76 0.59\nH 0 -0.76 0.59\n3\nsecond\n8 0 0 0.01\nh 0 0.75 0.6\nH 0 -0.75 0.6\n';
    const r = readXyz(text);
    if (!r.ok) throw new Error(r.message);
    expect(r.record.formula).toBe('H2O');
    expect(r.record.atoms![0]).toEqual({ symbol: 'O', x: 0, y: 0, z: 0.01 });
    expect(r.record.notes).toEqual(['2 frames; the last is used']);
    expect(r.record.energyHartree).toBeNull();
    expect(r.record.missing).toContain('electronic energy');
  });

  it('names the line of a bad atom', () => {
    expect(readXyz('2\n\nC 0 0 0\nQq 1 0 0\n')).toEqual({ ok: false, message: 'line 4: expected "symbol x y z" for atom 2 of 2, got "Qq 1 0 0"' });
    expect(readXyz('2\n\nC 0 0 0\n')).toMatchObject({ ok: false, message: expect.stringContaining('line 4') });
  });
});

describe('readCalculation', () => {
  it('chooses the reader from the content, not the file name', () => {
    expect(readCalculation(qcFixture('g16-dvb-freq.log'), 'a.out')).toMatchObject({ ok: true, record: { program: 'gaussian' } });
    expect(readCalculation(qcFixture('orca6-dvb-freq.out'), 'a.log')).toMatchObject({ ok: true, record: { program: 'orca' } });
    expect(readCalculation('1\n\nHe 0 0 0\n', 'he.xyz')).toMatchObject({ ok: true, record: { program: 'xyz', formula: 'He' } });
    expect(readCalculation('%PDF-1.7', 'paper.pdf')).toEqual({ ok: false, message: 'paper.pdf: not a Gaussian log, an ORCA output or an XYZ file' });
  });
});
