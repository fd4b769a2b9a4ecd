import { describe, expect, it } from 'vitest';
import { readDelimited } from '../../../core/import/delimited.ts';

describe('readDelimited', () => {
  it('takes the delimiter from the first line that has one, so a one-column first row does not hide tabs', () => {
    const { delimiter, rows } = readDelimited('-10\n-20\t0,2\t0.03\n');
    expect(delimiter).toBe('\t');
    expect(rows.map((r) => r.cells)).toEqual([['-10'], ['-20', '0,2', '0.03']]);
  });

  it('still reads comma and semicolon tables by their first line', () => {
    expect(readDelimited('a;b\n1,5;2').delimiter).toBe(';');
    expect(readDelimited('a,b\n1;2').delimiter).toBe(',');
  });
});
