import { describe, expect, it } from 'vitest';
import { formatErrors, parseDocument } from '../../../core/model/load.ts';
import { BOUNDS, formatLimit, outsideHard, outsideUsual } from '../../../core/model/bounds.ts';
import { FORMAT_VERSION } from '../../../core/model/schema.ts';

// Limits are common practice (core/model/bounds.ts); the hostile values are the audit's (issue 14).
function errorsOf(value: unknown): string {
  const result = parseDocument(typeof value === 'string' ? value : JSON.stringify(value));
  if (result.ok) throw new Error('expected the document to be refused');
  return formatErrors(result.errors);
}

const R = { id: 'p1', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } };
const withPoint = (extra: Record<string, unknown>, rest: Record<string, unknown> = {}) => ({
  format: 'passline', version: FORMAT_VERSION, ...rest,
  pathways: [{ id: 'a', name: 'A', points: [R, { id: 'p2', label: 'X', kind: 'min', energy: { mode: 'value', value: 1, unit: 'kcal/mol' }, ...extra }] }],
});
const withEnergy = (energy: unknown) => withPoint({ energy });

describe('schema bounds (BOUNDS is the one table)', () => {
  it('refuses figure layout numbers outside their bound, naming it', () => {
    expect(errorsOf(withPoint({ labelOffsetMm: { dx: 1e308, dy: 0 } }))).toBe('pathways[0].points[1].labelOffsetMm.dx: offset 1e+308 mm is outside −500 to 500 mm');
    expect(errorsOf(withPoint({}, { figure: { widthMm: 1e6 } }))).toBe('figure.widthMm: figure size 1000000 mm is outside 20 to 2000 mm');
    expect(errorsOf(withPoint({}, { figure: { widthMm: 0.001 } }))).toContain('figure size 0.001 mm is outside 20 to 2000 mm');
    expect(errorsOf(withPoint({ x: 1e308 }))).toBe('pathways[0].points[1].x: coordinate 1e+308 is outside −10000 to 10000');
    expect(errorsOf(withPoint({}, { figure: { fontSizePt: 500 } }))).toContain('figure.fontSizePt: font size 500 pt is outside 2 to 72 pt');
    expect(errorsOf(withPoint({ barWidthMm: 1e9 }))).toContain('pathways[0].points[1].barWidthMm: length 1000000000 mm');
  });

  it('refuses absurd physical inputs and says which bound, in the unit that was typed', () => {
    expect(errorsOf(withEnergy({ mode: 'value', value: 1e308, unit: 'kcal/mol' }))).toBe(
      'pathways[0].points[1].energy.value: relative energy 1e+308 kcal/mol is outside −23900.6 to 23900.6 kcal/mol (−100000 to 100000 kJ/mol)');
    expect(errorsOf(withEnergy({ mode: 'barrier', value: -1e308, unit: 'kJ/mol' }))).toBe(
      'pathways[0].points[1].energy.value: relative energy -1e+308 kJ/mol is outside −100000 to 100000 kJ/mol');
    expect(errorsOf(withEnergy({ mode: 'estimate', estimate: { method: 'marcus', lambda: 1e308, unit: 'kJ/mol' } }))).toContain('energy.estimate.lambda: reorganisation energy λ 1e+308 kJ/mol is outside');
    expect(errorsOf(withEnergy({ mode: 'estimate', estimate: { method: 'halfLife', seconds: 5e-324 } }))).toContain('energy.estimate.seconds: time 5e-324 s is outside 1 × 10⁻¹⁵ to 1 × 10²⁰ s');
    expect(errorsOf(withPoint({}, { settings: { transmission: 1e308 } }))).toBe('settings.transmission: transmission coefficient 1e+308 is outside 1 × 10⁻⁶ to 1');
    expect(errorsOf(withPoint({}, { settings: { temperatureK: 1e-300 } }))).toContain('settings.temperatureK: temperature 1e-300 K is outside 1 to 10000 K');
    expect(errorsOf(withPoint({}, { settings: { temperatureK: 1e12 } }))).toContain('temperature 1000000000000 K is outside');
    const species = [{ id: 's', label: 'S', structures: [{ electronic: 1e308 }, { electronic: -1e308, gCorrection: 1e5 }] }];
    const hartree = errorsOf({ ...withPoint({}), species });
    expect(hartree).toContain('species[0].structures[0].electronic: absolute energy 1e+308 hartree is outside');
    expect(hartree).toContain('species[0].structures[1].electronic: absolute energy -1e+308 hartree');
    expect(hartree).toContain('species[0].structures[1].gCorrection: thermal correction 100000 hartree');
  });

  it('every value on the edge of a bound is accepted', () => {
    const edge = withPoint({ x: BOUNDS.coordinate.hard[1], labelOffsetMm: { dx: -500, dy: 500 } },
      { settings: { temperatureK: BOUNDS.temperatureK.hard[0], transmission: 1 }, figure: { widthMm: 20, heightMm: 2000 } });
    expect(parseDocument(JSON.stringify(edge)).ok).toBe(true);
  });

  it('caps text length and the number of points, at once', () => {
    expect(errorsOf(withPoint({ label: 'x'.repeat(100_000) }))).toBe('pathways[0].points[1].label: text of 100000 characters is longer than the limit of 1000 characters');
    const many = Array.from({ length: 100_000 }, (_, i) => ({ id: `p${i}`, label: `P${i}`, kind: 'min', energy: { mode: 'value', value: i % 7, unit: 'kcal/mol' } }));
    const message = errorsOf({ format: 'passline', version: FORMAT_VERSION, pathways: [{ id: 'a', name: 'A', points: many }] });
    expect(message).toBe(`pathways: the document has 100000 points; the limit is ${BOUNDS.pointCount.hard[1]} points over all pathways`);
  });

  it('reads a text annotation height in the display unit', () => {
    expect(errorsOf(withPoint({}, { figure: { annotations: [{ type: 'text', text: 'hi', x: 1, y: 1e308 }] } }))).toContain('figure.annotations[0].y: relative energy 1e+308 kcal/mol');
  });
});

describe('migration of version 1 drafts', () => {
  it('names null entries instead of crashing', () => {
    const v1 = { format: 'passline', version: 1, settings: null, pathways: [null, { name: 'A', points: [null, { label: 'R', kind: 'min', energy: 0 }] }] };
    const message = errorsOf(v1);
    expect(message).toContain('pathways[0]: expected object, got null');
    expect(message).toContain('pathways[1].points[0]: expected object, got null');
  });
});

describe('bound messages write their limits in the app notation', () => {
  it('powers of ten as "× 10ⁿ", round numbers plain, the typographic minus', () => {
    expect(formatLimit(1e20)).toBe('1 × 10²⁰');
    expect(formatLimit(1e-40)).toBe('1 × 10⁻⁴⁰');
    expect(formatLimit(1e-6)).toBe('1 × 10⁻⁶');
    expect(formatLimit(-1e6)).toBe('−1 × 10⁶');
    expect(formatLimit(2.5e7)).toBe('2.5 × 10⁷');
    expect(formatLimit(10_000)).toBe('10000');
    expect(formatLimit(-23900.6)).toBe('−23900.6');
    expect(formatLimit(0.05)).toBe('0.05');
    expect(formatLimit(0)).toBe('0');
  });

  it('rate-constant messages no longer print "100000000000000000000"', () => {
    expect(outsideHard('rateConstant', 1e25)).toBe('rate constant 1e+25 (s⁻¹, M⁻¹ s⁻¹, …) is outside 1 × 10⁻⁴⁰ to 1 × 10²⁰ (s⁻¹, M⁻¹ s⁻¹, …)');
    expect(outsideUsual('rateConstant', 1e15)).toBe('rate constant 1000000000000000 (s⁻¹, M⁻¹ s⁻¹, …) is unusual (usually 1 × 10⁻²⁰ to 1 × 10¹³ (s⁻¹, M⁻¹ s⁻¹, …))');
    expect(outsideUsual('temperatureK', 5)).toBe('temperature 5 K is unusual (usually 100 to 2000 K)');
  });
});
