import type { Document, Quantity, Species } from '../model/schema.ts';
import { formationRoute, type FormationRoute } from './formationSum.ts';

/** What every point resolver needs to know about the document. */
export interface ResolveContext {
  quantity: Quantity;
  temperatureK: number;
  standardState: Document['settings']['standardState'];
  transmission: number;
  species: ReadonlyMap<string, Species>;
  /** How formation-data states give G (see {@link FormationRoute}). */
  formationRoute: FormationRoute;
}

/** Builds the resolver context from a validated document. */
export function makeContext(doc: Document): ResolveContext {
  return {
    quantity: doc.settings.quantity,
    temperatureK: doc.settings.temperatureK,
    standardState: doc.settings.standardState,
    transmission: doc.settings.transmission,
    species: new Map(doc.species.map((s) => [s.id, s])),
    formationRoute: formationRoute(doc),
  };
}
