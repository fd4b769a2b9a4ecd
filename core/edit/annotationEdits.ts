import type { Document, Figure } from '../model/schema.ts';

/** One figure annotation: a barrier arrow, the energetic-span bracket of a cycle, or free text. */
export type Annotation = Figure['annotations'][number];

/**
 * Why an annotation cannot be added to this document, or null when it can: a barrier
 * arrow needs two different points of one pathway, a span bracket a pathway marked as a
 * catalytic cycle, a text some words and a finite position.
 */
export function annotationProblem(doc: Document, a: Annotation): string | null {
  if (a.type === 'text') {
    if (a.text.trim() === '') return 'text: expected some words';
    if (!Number.isFinite(a.x) || !Number.isFinite(a.y)) return 'text: expected a finite position (x in slots, y in the display unit)';
    return null;
  }
  const pathway = doc.pathways.find((p) => p.id === a.pathway);
  if (!pathway) return `no pathway with id "${a.pathway}"`;
  if (a.type === 'span') return pathway.cycle ? null : `pathway "${pathway.name || pathway.id}" is not marked as a catalytic cycle`;
  if (pathway.points.length < 2) return `pathway "${pathway.name || pathway.id}" needs two points for a barrier arrow`;
  const ids = pathway.points.map((p) => p.id);
  for (const id of [a.from, a.to]) if (!ids.includes(id)) return `pathway "${pathway.name || pathway.id}" has no point "${id}"`;
  return a.from === a.to ? 'a barrier arrow needs two different points' : null;
}

/**
 * Adds an annotation to the figure. One {@link annotationProblem} refuses, or one equal to
 * an annotation already there, leaves the document as it is. Text is kept as typed,
 * without surrounding spaces.
 */
export function addAnnotation(doc: Document, args: { annotation: Annotation }): Document {
  const a = args.annotation.type === 'text' ? { ...args.annotation, text: args.annotation.text.trim() } : args.annotation;
  if (annotationProblem(doc, a)) return doc;
  const key = JSON.stringify(a);
  if (doc.figure.annotations.some((b) => JSON.stringify(b) === key)) return doc;
  return { ...doc, figure: { ...doc.figure, annotations: [...doc.figure.annotations, a] } };
}

/** Removes the annotation at `index`. */
export function removeAnnotation(doc: Document, args: { index: number }): Document {
  const list = doc.figure.annotations;
  if (args.index < 0 || args.index >= list.length) return doc;
  return { ...doc, figure: { ...doc.figure, annotations: list.filter((_, i) => i !== args.index) } };
}
