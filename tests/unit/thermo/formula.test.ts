import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ELEMENT_SYMBOLS, parseFormula, sumCompositions, type ParsedFormula } from '../../../core/thermo/index.ts';

function parsed(text: string): ParsedFormula {
  const r = parseFormula(text);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

function failure(text: string): { position: number; text: string; message: string } {
  const r = parseFormula(text);
  if (r.ok) throw new Error(`expected '${text}' to fail`);
  return r.error;
}

describe('parseFormula on real compounds', () => {
  // Element counts of well-known compounds (molecular formulas, from memory; they follow from the structures).
  it.each([
    ['C8H10N4O2', { C: 8, H: 10, N: 4, O: 2 }], // caffeine
    ['C6H12O6', { C: 6, H: 12, O: 6 }], // glucose
    ['Ca(OH)2', { Ca: 1, O: 2, H: 2 }],
    ['Al2(SO4)3', { Al: 2, S: 3, O: 12 }],
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['CuSO4*5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['K4[Fe(CN)6]', { K: 4, Fe: 1, C: 6, N: 6 }],
    ['[Pd(PPh3)2]', { Pd: 1, P: 2, C: 36, H: 30 }],
    ['Pd(PPh3)4', { Pd: 1, P: 4, C: 72, H: 60 }],
    ['Fe(C5H5)2', { Fe: 1, C: 10, H: 10 }], // ferrocene
    ['FeCp2', { Fe: 1, C: 10, H: 10 }],
    ['NEt3', { N: 1, C: 6, H: 15 }],
    ['tBuOH', { C: 4, H: 10, O: 1 }],
    ['Mg(ClO4)2·6H2O', { Mg: 1, Cl: 2, O: 14, H: 12 }],
    ['{[Cu(NH3)4](H2O)2}', { Cu: 1, N: 4, H: 16, O: 2 }],
    ['D2O', { D: 2, O: 1 }],
    ['Fe0.95O', { Fe: 0.95, O: 1 }],
  ])('%s', (text, counts) => {
    const f = parsed(text);
    expect(f.counts).toEqual(counts);
    expect(f.charge).toBe(0);
  });

  it('reads charges written with a caret, superscripts, a space or a bare sign', () => {
    expect(parsed('NH4^+')).toMatchObject({ counts: { N: 1, H: 4 }, charge: 1 });
    expect(parsed('NH4+')).toMatchObject({ counts: { N: 1, H: 4 }, charge: 1 });
    expect(parsed('SO4^2-')).toMatchObject({ counts: { S: 1, O: 4 }, charge: -2 });
    expect(parsed('SO4^{2-}').charge).toBe(-2);
    expect(parsed('SO4 2-').charge).toBe(-2);
    expect(parsed('CO3²⁻')).toMatchObject({ counts: { C: 1, O: 3 }, charge: -2 });
    expect(parsed('OH-').charge).toBe(-1);
    expect(parsed('H3O+')).toMatchObject({ counts: { H: 3, O: 1 }, charge: 1 });
    expect(parsed('[Fe(CN)6]4-')).toMatchObject({ counts: { Fe: 1, C: 6, N: 6 }, charge: -4 });
    expect(parsed('Fe^3+').charge).toBe(3);
    expect(parsed('e^-')).toMatchObject({ counts: {}, charge: -1 });
  });

  it('reads a bare charge on a lone element as its charge, and says so', () => {
    const fe = parsed('Fe2+');
    expect(fe).toMatchObject({ counts: { Fe: 1 }, charge: 2 });
    expect(fe.notes[0]).toContain('Fe2^+');
    expect(parsed('Fe2^+')).toMatchObject({ counts: { Fe: 2 }, charge: 1 });
  });

  it('takes a charge given separately and refuses a contradicting written one', () => {
    expect(parsed('NH4').charge).toBe(0);
    const r = parseFormula('NH4', { charge: 1 });
    expect(r.ok && r.value.charge).toBe(1);
    expect(parseFormula('NH4^+', { charge: 1 }).ok).toBe(true);
    const bad = parseFormula('NH4^+', { charge: 2 });
    expect(!bad.ok && bad.error.message).toContain('disagrees');
  });

  it('strips and returns the phase', () => {
    expect(parsed('H2O(l)').phase).toBe('l');
    expect(parsed('CO2(g)').phase).toBe('g');
    expect(parsed('NaCl(s)').phase).toBe('s');
    expect(parsed('Cl^-(aq)')).toMatchObject({ counts: { Cl: 1 }, charge: -1, phase: 'aq' });
    expect(parsed('NH4+(aq)')).toMatchObject({ charge: 1, phase: 'aq' });
    expect(parsed('CH4').phase).toBeNull();
  });
});

describe('parseFormula errors name the position and text', () => {
  it('unknown element symbol', () => {
    const e = failure('CaXz2');
    expect(e).toMatchObject({ position: 2, text: 'Xz' });
    expect(e.message).toBe("'CaXz2', character 3: unknown element symbol 'Xz'");
  });
  it('unbalanced parentheses', () => {
    expect(failure('Ca(OH2')).toMatchObject({ position: 2, text: '(' });
    expect(failure('CaOH)2')).toMatchObject({ position: 4, text: ')' });
    expect(failure('K4[Fe(CN)6)').message).toContain("'[' at character 3 closed by ')'");
  });
  it('bad counts', () => {
    expect(failure('H0')).toMatchObject({ position: 1, text: '0' });
    expect(failure('C1.2.3')).toMatchObject({ position: 1, text: '1.2.3' });
    expect(failure('2H2O').message).toContain('coefficients in the reaction');
    expect(failure('(3)').message).toContain("count '3' without an element");
  });
  it('ambiguous and malformed charges', () => {
    expect(failure('SO42-').message).toContain('SO4^2-');
    expect(failure('NH4^x').message).toContain('bad charge');
  });
  it('empty input and dangling hydrate dot', () => {
    expect(failure('').message).toContain('empty formula');
    expect(failure('CuSO4·').message).toContain('nothing after');
    expect(failure('Ca OH').message).toContain("unexpected ' '");
  });
});

describe('parseFormula properties (fast-check)', () => {
  const element = fc.constantFrom(...ELEMENT_SYMBOLS);
  const part = fc.array(fc.tuple(element, fc.integer({ min: 1, max: 30 })), { minLength: 1, maxLength: 6 });
  const write = (p: [string, number][]): string => p.map(([e, n]) => (n === 1 ? e : `${e}${n}`)).join('');

  it('counts are additive over concatenation and groups', () => {
    fc.assert(fc.property(part, part, fc.integer({ min: 1, max: 9 }), (a, b, n) => {
      const fa = parsed(write(a));
      const fb = parsed(write(b));
      const expected = sumCompositions([{ formula: fa, count: 1 }, { formula: fb, count: n }]).counts;
      expect(parsed(`${write(a)}(${write(b)})${n}`).counts).toEqual(expected);
      expect(parsed(`${write(a)}·${n}${write(b)}`).counts).toEqual(expected);
    }));
  });

  it('the count of each element is the sum of its written counts', () => {
    fc.assert(fc.property(part, (p) => {
      const counts = parsed(write(p)).counts;
      for (const e of new Set(p.map(([x]) => x))) {
        expect(counts[e]).toBe(p.filter(([x]) => x === e).reduce((s, [, n]) => s + n, 0));
      }
    }));
  });
});

describe('ELEMENT_SYMBOLS', () => {
  it('holds the 118 elements plus D and T', () => {
    // IUPAC periodic table (2016 names, from memory): 118 elements, Og last.
    expect(ELEMENT_SYMBOLS.length).toBe(120);
    expect(ELEMENT_SYMBOLS[117]).toBe('Og');
    expect(ELEMENT_SYMBOLS[25]).toBe('Fe');
  });
});
