import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { formatErrors, makeDocument, parseDocument, serializeDocument } from '../../../core/model/load.ts';
import { FORMAT_VERSION } from '../../../core/model/schema.ts';

const demoText = readFileSync(new URL('../../../assets/demo/demo.passline', import.meta.url), 'utf8');

function errorsOf(value: unknown): string {
  const result = parseDocument(typeof value === 'string' ? value : JSON.stringify(value));
  if (result.ok) throw new Error('expected the document to be refused');
  return formatErrors(result.errors);
}

const onePoint = (energy: unknown, kind = 'min') => ({
  format: 'passline', version: FORMAT_VERSION,
  pathways: [{ id: 'a', name: 'A', points: [{ id: 'p1', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } }, { id: 'p2', label: 'X', kind, energy }] }],
});

describe('parseDocument', () => {
  it('reads the demo document', () => {
    const result = parseDocument(demoText);
    expect(result.ok).toBe(true);
  });

  it('round-trips: load → save → load gives an equal document', () => {
    const first = parseDocument(demoText);
    if (!first.ok) throw new Error('demo must load');
    const second = parseDocument(serializeDocument(first.doc));
    expect(second.ok && second.doc).toEqual(first.doc);
  });

  it('names the field path and the expected unit for a bad energy', () => {
    expect(errorsOf(onePoint({ mode: 'value', value: 'abc', unit: 'kcal/mol' }))).toBe(
      'pathways[0].points[1].energy.value: expected a number in kcal/mol, got "abc"');
  });

  it('names a bad kind and an unknown energy mode', () => {
    expect(errorsOf(onePoint({ mode: 'value', value: 1, unit: 'kcal/mol' }, 'saddle'))).toContain('pathways[0].points[1].kind: expected "min" or "ts", got "saddle"');
    expect(errorsOf(onePoint({ mode: 'guess' }))).toContain('pathways[0].points[1].energy.mode: expected an energy mode');
  });

  it('refuses unknown fields instead of dropping them silently', () => {
    expect(errorsOf({ ...onePoint({ mode: 'value', value: 1, unit: 'kcal/mol' }), colour: 'red' })).toContain('unknown field "colour"');
  });

  it('refuses an unknown unit and non-finite numbers', () => {
    expect(errorsOf(onePoint({ mode: 'value', value: 1, unit: 'kcal' }))).toContain('energy.unit: expected one of kcal/mol');
    // JSON has no NaN or Infinity: JSON.stringify writes null, which must be refused by name.
    expect(errorsOf(onePoint({ mode: 'value', value: Number.NaN, unit: 'kcal/mol' }))).toContain('energy.value: expected a number in kcal/mol, got null');
    expect(errorsOf('{"format":"passline","version":2,"settings":{"temperatureK":1e999}}')).toContain('settings.temperatureK: expected a number in K, got Infinity');
  });

  it('refuses a document from a newer format version with a clear message', () => {
    expect(errorsOf({ format: 'passline', version: FORMAT_VERSION + 1 })).toMatch(/format version 4, written by a newer Passline; this one reads versions up to 3/);
  });

  it('refuses text that is not JSON or not a Passline document', () => {
    expect(errorsOf('{"format": "passline",')).toMatch(/^\(document\): not valid JSON/);
    expect(errorsOf({ hello: 1 })).toContain('not a Passline document');
    expect(errorsOf('[]')).toContain('expected a JSON object');
  });

  it('reports references to missing species and duplicate ids', () => {
    const doc = makeDocument({ pathways: [] });
    const text = JSON.stringify({
      ...doc, species: [{ id: 's', label: 'S' }, { id: 's', label: 'S2' }],
      pathways: [{ id: 'a', name: 'A', points: [{ id: 'p', label: 'R', kind: 'min', energy: { mode: 'species', terms: [{ species: 'ghost', count: 1 }] } }] }],
    });
    const message = errorsOf(text);
    expect(message).toContain('species: species id "s" is used more than once');
    expect(message).toContain('pathways[0].points[0].energy.terms[0].species: no species with id "ghost"');
  });

  it('migrates a version 1 draft (bare numbers, no ids) to the current version', () => {
    const result = parseDocument(JSON.stringify({ format: 'passline', version: 1, settings: { unit: 'kJ/mol' }, pathways: [{ name: 'A', points: [{ label: 'R', kind: 'min', energy: 0 }, { label: 'T', kind: 'ts', energy: 80 }] }] }));
    expect(result.ok && result.migratedFrom).toBe(1);
    if (!result.ok) return;
    expect(result.doc.version).toBe(FORMAT_VERSION);
    expect(result.doc.pathways[0]!.points[1]).toMatchObject({ id: 'p2', energy: { mode: 'value', value: 80, unit: 'kJ/mol' } });
  });

  it('keeps hostile label text intact as data', () => {
    const doc = makeDocument({ pathways: [{ id: 'a', name: '<script>alert(1)</script>', points: [{ id: 'p', label: '& "x" <b>', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } }] }] });
    const back = parseDocument(serializeDocument(doc));
    expect(back.ok && back.doc.pathways[0]!.points[0]!.label).toBe('& "x" <b>');
  });
});
