import { describe, expect, it } from 'vitest';
import { perceiveBonds } from '../../../core/structure/perceiveBonds.ts';
import { readXyz } from '../../../core/structure/readXyz.ts';

// Benzene as a regular hexagon, C–C 1.39 Å and C–H 1.09 Å (experimental bond lengths of
// benzene, from memory; any values near these give the same bonds).
function benzeneXyz(): string {
  const lines = ['12', 'benzene'];
  for (let i = 0; i < 6; i++) {
    const t = (i * Math.PI) / 3;
    lines.push(`C ${(1.39 * Math.cos(t)).toFixed(4)} ${(1.39 * Math.sin(t)).toFixed(4)} 0`);
    lines.push(`H ${(2.48 * Math.cos(t)).toFixed(4)} ${(2.48 * Math.sin(t)).toFixed(4)} 0`);
  }
  return lines.join('\n');
}

describe('readXyz', () => {
  it('reads the counted form and bare atom lines, atomic numbers as symbols', () => {
    expect(readXyz('3\nwater\nO 0 0 0.12\nH 0 0.76 -0.47\nH 0 -0.76 -0.47\n')).toMatchObject({ ok: true, atoms: [{ element: 'O' }, { element: 'H' }, { element: 'H' }] });
    expect(readXyz('8 0 0 0\n1 0 0.76 -0.47')).toMatchObject({ ok: true, atoms: [{ element: 'O' }, { element: 'H' }] });
  });
  it('names the line of a bad atom and a count that does not match', () => {
    expect(readXyz('2\nx\nO 0 0 0\nXx 1 0 0')).toEqual({ ok: false, message: 'XYZ line 4: "Xx" is not an element symbol' });
    expect(readXyz('3\nx\nO 0 0 0\nH 1 0 0')).toEqual({ ok: false, message: 'XYZ: the first line says 3 atoms, 2 found' });
    expect(readXyz('O 0 zero 0')).toMatchObject({ ok: false, message: /line 1: expected a symbol and three coordinates/ });
  });
});

describe('perceiveBonds', () => {
  it('finds the 12 bonds of benzene and one Kekulé structure (three double bonds, alternating)', () => {
    const read = readXyz(benzeneXyz());
    if (!read.ok) throw new Error(read.message);
    const bonds = perceiveBonds(read.atoms);
    expect(bonds).toHaveLength(12);
    const ring = bonds.filter((b) => read.atoms[b.from]!.element === 'C' && read.atoms[b.to]!.element === 'C');
    expect(ring.filter((b) => b.order === 2)).toHaveLength(3);
    const doubleAt = new Map<number, number>();
    for (const b of ring) if (b.order === 2) for (const a of [b.from, b.to]) doubleAt.set(a, (doubleAt.get(a) ?? 0) + 1);
    expect([...doubleAt.values()]).toEqual([1, 1, 1, 1, 1, 1]);
  });
  it('gives a triple bond to HCN and a zero-order bond to a metal', () => {
    const hcn = readXyz('H 0 0 -1.066\nC 0 0 0\nN 0 0 1.156');
    if (!hcn.ok) throw new Error(hcn.message);
    expect(perceiveBonds(hcn.atoms).map((b) => b.order)).toEqual([1, 3]);
    const pdcl = readXyz('Pd 0 0 0\nCl 2.3 0 0');
    if (!pdcl.ok) throw new Error(pdcl.message);
    expect(perceiveBonds(pdcl.atoms)).toEqual([{ from: 0, to: 1, order: 0 }]);
  });
});
