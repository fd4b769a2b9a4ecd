import { describe, expect, it } from 'vitest';
import { checkReactionBalance, netStoichiometry, parseReaction, type Reaction } from '../../../core/thermo/index.ts';

function reaction(text: string): Reaction {
  const r = parseReaction(text);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe('parseReaction', () => {
  it('reads species, coefficients and the arrow', () => {
    expect(reaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)')).toEqual({
      reactants: [{ species: 'CH4(g)', coefficient: 1 }, { species: 'O2(g)', coefficient: 2 }],
      products: [{ species: 'CO2(g)', coefficient: 1 }, { species: 'H2O(l)', coefficient: 2 }],
    });
  });
  it.each(['→', '=', '<=>', '⇌', '=>'])('accepts the arrow %s', (arrow) => {
    expect(reaction(`N2(g) + 3 H2(g) ${arrow} 2 NH3(g)`).products).toEqual([{ species: 'NH3(g)', coefficient: 2 }]);
  });
  it('reads fractional and decimal coefficients, with or without a space', () => {
    const r = reaction('H2(g) + 1/2 O2(g) -> H2O(l)');
    expect(r.reactants[1]).toEqual({ species: 'O2(g)', coefficient: 0.5 });
    expect(reaction('H2(g) + 0.5 O2(g) -> H2O(l)').reactants[1]?.coefficient).toBe(0.5);
    expect(reaction('2H2(g) + O2(g) -> 2H2O(l)').reactants[0]).toEqual({ species: 'H2(g)', coefficient: 2 });
  });
  it('keeps charges with their species', () => {
    const r = reaction('NH4^+ + OH^- -> NH3 + H2O');
    expect(r.reactants.map((t) => t.species)).toEqual(['NH4^+', 'OH^-']);
    expect(reaction('NH4+ + OH- -> NH3 + H2O').reactants.map((t) => t.species)).toEqual(['NH4+', 'OH-']);
  });
  it('refuses malformed input with a message', () => {
    const msg = (t: string): string => { const r = parseReaction(t); return r.ok ? '' : r.message; };
    expect(msg('CH4 + O2')).toContain('no arrow');
    expect(msg('A -> B -> C')).toContain('more than one arrow');
    expect(msg(' -> CO2')).toContain('left');
    expect(msg('CO2 -> ')).toContain('right');
    expect(msg('CH4 +  + O2 -> CO2')).toContain('empty species');
    expect(msg('0 O2 -> O2')).toContain("bad coefficient '0'");
    expect(msg('1/0 O2 -> O2')).toContain('bad coefficient');
    expect(msg('H2 +O2 -> H2O2')).toContain("separate species with ' + '");
  });
});

describe('netStoichiometry', () => {
  it('is positive for products and nets a species on both sides', () => {
    const nu = netStoichiometry(reaction('A + 2 B -> C + B'));
    expect([...nu]).toEqual([['A', -1], ['B', -1], ['C', 1]]);
  });
});

describe('checkReactionBalance', () => {
  it('accepts the balanced NIST-JANAF reactions R1–R3 of REFERENCE.md §4', () => {
    for (const r of ['CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)', 'N2(g) + 3 H2(g) -> 2 NH3(g)', 'CO(g) + H2O(g) -> CO2(g) + H2(g)']) {
      expect(checkReactionBalance(reaction(r))).toEqual({ ok: true });
    }
  });
  it('accepts fractional coefficients and charged species', () => {
    expect(checkReactionBalance(reaction('H2(g) + 1/2 O2(g) -> H2O(l)')).ok).toBe(true);
    expect(checkReactionBalance(reaction('Fe^3+ + e^- -> Fe^2+')).ok).toBe(true);
    expect(checkReactionBalance(reaction('NH4^+ + OH^- -> NH3 + H2O')).ok).toBe(true);
  });
  it('names the element and side of an imbalance', () => {
    const r = checkReactionBalance(reaction('CH4(g) + O2(g) -> CO2(g) + 2 H2O(l)'));
    expect(r).toMatchObject({ ok: false, message: 'unbalanced: 2 more O on the right' });
    const h = checkReactionBalance(reaction('N2(g) + H2(g) -> 2 NH3(g)'));
    expect(!h.ok && h.message).toBe('unbalanced: 4 more H on the right');
  });
  it('names a charge imbalance', () => {
    const r = checkReactionBalance(reaction('Fe^3+ -> Fe^2+'));
    expect(!r.ok && r.message).toBe('unbalanced: charge 1 lower on the right');
  });
  it('names the species whose formula cannot be read', () => {
    const r = checkReactionBalance(reaction('Xy + O2 -> XyO2'));
    expect(!r.ok && r.message).toContain("species 'Xy'");
  });
});
