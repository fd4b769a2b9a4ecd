import { makeDocument } from '../../../../core/model/load.ts';
import { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';
import { createFakeHost } from '../host/fakeHost.ts';

/**
 * An invented two-step route typed in kcal/mol: A 0, TS 20 (a barrier over A), B −5.
 * 1 kcal = 4184 J (thermochemical calorie, NIST SP 811 App. B; REFERENCE.md §1).
 */
export function routeStore(): DocumentStore {
  const doc = makeDocument({
    title: 'Invented route',
    species: [{ id: 'sa', label: 'SA', structures: [{ electronic: -10 }] }],
    pathways: [{
      id: 'p', name: 'Route', points: [
        { id: 'a', label: 'A', kind: 'min', energy: { mode: 'value', value: 0, unit: 'kcal/mol' } },
        { id: 't', label: 'TS', kind: 'ts', energy: { mode: 'barrier', value: 20, unit: 'kcal/mol' } },
        { id: 'b', label: 'B', kind: 'min', energy: { mode: 'value', value: -5, unit: 'kcal/mol' } },
      ],
    }],
  });
  return new DocumentStore(createFakeHost().host, doc, 'route.passline');
}
