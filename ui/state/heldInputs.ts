import type { Document } from '../../core/model/schema.ts';
import type { UnresolvedInput } from '../../core/profile/checks/unresolvedInputs.ts';

/** Where an entry is typed: a point's field ("species sum", "energy", "λ", …). */
export type InputPlace = Pick<UnresolvedInput, 'pathway' | 'point' | 'field'>;

/** Text typed that was refused, and why. */
export interface HeldEntry { text: string; message: string }

/** An unresolved entry and the point data it was typed over. */
export interface HeldInput extends UnresolvedInput {
  /** The point's energy spec when the entry was typed; once the document holds another, the entry no longer applies. */
  basis: unknown;
}

const energyOf = (doc: Document, place: InputPlace): unknown =>
  doc.pathways.find((p) => p.id === place.pathway)?.points.find((p) => p.id === place.point)?.energy;

const samePlace = (a: InputPlace, b: InputPlace) => a.pathway === b.pathway && a.point === b.point && a.field === b.field;

/** `held` with the entry at `place` set to `text` (replacing any before). */
export function withInput(doc: Document, held: readonly HeldInput[], place: InputPlace, text: string, message: string): HeldInput[] {
  const basis = energyOf(doc, place);
  return [...held.filter((h) => !samePlace(h, place)), { ...place, text, message, basis }];
}

/** `held` without the entry at `place` (the same array when there is none). */
export function withoutInput(held: readonly HeldInput[], place: InputPlace): readonly HeldInput[] {
  return held.some((h) => samePlace(h, place)) ? held.filter((h) => !samePlace(h, place)) : held;
}

/** The entries whose point still exists with the energy spec they were typed over (an undo, a drag or a delete retires them). */
export function activeInputs(doc: Document, held: readonly HeldInput[]): readonly HeldInput[] {
  if (held.length === 0) return held;
  const active = held.filter((h) => h.basis !== undefined && energyOf(doc, h) === h.basis);
  return active.length === held.length ? held : active;
}
