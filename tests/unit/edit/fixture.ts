import { makeDocument } from '../../../core/model/load.ts';
import { validateDocument } from '../../../core/model/load.ts';
import type { Document } from '../../../core/model/schema.ts';

/** An invented three-point route plus a second one, all typed in kcal/mol. */
export function twoRoutes(): Document {
  return makeDocument({
    title: 'Invented',
    species: [
      { id: 'a', label: 'A', structures: [{ electronic: -100 }] },
      { id: 'b', label: 'B', structures: [] },
    ],
    pathways: [
      { id: 'p', name: 'Route', points: [
        { id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
        { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol' } },
        { id: 'i', label: 'I', kind: 'min', energy: { mode: 'step', value: -5, unit: 'kJ/mol' } },
        { id: 's', label: 'S', kind: 'min', energy: { mode: 'species', terms: [{ species: 'a', count: 1 }] } },
      ] },
      { id: 'q', name: 'Other', points: [
        { id: 'r', label: 'R', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
      ] },
    ],
    comparisons: [{ type: 'rate', baseline: 'p', candidate: 'q' }],
    figure: { annotations: [{ type: 'barrier', pathway: 'p', from: 'r', to: 't' }] },
  });
}

/** Throws unless the document still passes the loader's schema and reference checks. */
export function expectLoadable(doc: Document): void {
  const result = validateDocument(JSON.parse(JSON.stringify(doc)));
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
}
