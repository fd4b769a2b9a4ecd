import { describe, expect, it } from 'vitest';
import { parseMarkup } from '../../../core/figure/text/parseMarkup.ts';
import { autoSubscript } from '../../../core/figure/text/autoSubscript.ts';
import { layoutRichText } from '../../../core/figure/text/layoutRichText.ts';
import { measureText } from '../../../core/figure/font/measureText.ts';
import { fontMetrics } from './fontFixture.ts';

const plain = (text: string) => [{ text, shift: 'base' as const }];

describe('parseMarkup', () => {
  it('lowers and raises single characters and groups', () => {
    expect(parseMarkup('H_2O')).toEqual([{ text: 'H', shift: 'base' }, { text: '2', shift: 'sub' }, { text: 'O', shift: 'base' }]);
    expect(parseMarkup('Cu^{2+}')).toEqual([{ text: 'Cu', shift: 'base' }, { text: '2+', shift: 'sup' }]);
    expect(parseMarkup('NH_4^+')).toEqual([{ text: 'NH', shift: 'base' }, { text: '4', shift: 'sub' }, { text: '+', shift: 'sup' }]);
  });

  it('keeps escaped markup characters and Unicode as typed', () => {
    expect(parseMarkup('a\\_b \\^ \\\\ ΔG‡')).toEqual(plain('a_b ^ \\ ΔG‡'));
  });

  it('never fails on unfinished markup', () => {
    expect(parseMarkup('x_{12')).toEqual([{ text: 'x', shift: 'base' }, { text: '12', shift: 'sub' }]);
    expect(parseMarkup('end_')).toEqual(plain('end_'));
    expect(parseMarkup('')).toEqual([]);
  });

  it('treats hostile text as ordinary characters', () => {
    expect(parseMarkup('<script>&"\'')).toEqual(plain('<script>&"\''));
  });
});

describe('autoSubscript', () => {
  const lowered = (text: string) => autoSubscript(plain(text));
  it('lowers counts in formulas', () => {
    expect(lowered('H2O')).toEqual([{ text: 'H', shift: 'base' }, { text: '2', shift: 'sub' }, { text: 'O', shift: 'base' }]);
    expect(lowered('Pd(PPh3)4')).toEqual([
      { text: 'Pd(PPh', shift: 'base' }, { text: '3', shift: 'sub' }, { text: ')', shift: 'base' }, { text: '4', shift: 'sub' },
    ]);
  });

  it('leaves state names and coefficients alone', () => {
    expect(lowered('TS1 + 2 CO2')).toEqual([{ text: 'TS1 + 2 CO', shift: 'base' }, { text: '2', shift: 'sub' }]);
    expect(lowered('Int2')).toEqual(plain('Int2'));
    expect(lowered('2H2')).toEqual([{ text: '2H', shift: 'base' }, { text: '2', shift: 'sub' }]);
  });

  it('does not touch explicit scripts', () => {
    expect(autoSubscript([{ text: 'H2', shift: 'sup' }])).toEqual([{ text: 'H2', shift: 'sup' }]);
  });
});

describe('layoutRichText', () => {
  it('places runs end to end, scripts smaller and shifted', () => {
    const m = fontMetrics();
    const line = layoutRichText(parseMarkup('H_2O^+'), m, 3);
    expect(line.runs.map((r) => r.text)).toEqual(['H', '2', 'O', '+']);
    expect(line.runs[1]!.dx).toBeCloseTo(measureText(m, 'H', 3), 12);
    expect(line.runs[1]!.sizeMm).toBeLessThan(3);
    expect(line.runs[1]!.dy).toBeGreaterThan(0);
    expect(line.runs[3]!.dy).toBeLessThan(0);
    expect(line.width).toBeCloseTo(measureText(m, 'HO', 3) + measureText(m, '2+', line.runs[1]!.sizeMm), 12);
  });
});
