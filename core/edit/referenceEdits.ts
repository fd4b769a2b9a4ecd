import type { Document, Reference } from '../model/schema.ts';
import { referenceProblems } from '../model/references.ts';
import { setSettings, settingsProblem } from './settingsEdits.ts';

/**
 * Why `reference` cannot be what the document's energies are measured from (an empty
 * species sum, a species or point the document does not have), or null when it can.
 */
export function referenceProblem(doc: Document, reference: Reference): string | null {
  const schema = settingsProblem(doc.settings, { reference });
  if (schema) return schema.replace(/^reference\.(terms: )?/, '');
  const problem = referenceProblems({ ...doc, settings: { ...doc.settings, reference } }).find((e) => e.path.startsWith('settings.reference'));
  return problem ? problem.message : null;
}

/**
 * Sets what every energy is measured from (see `Settings.reference`). A reference that
 * {@link referenceProblem} refuses leaves the document as it is.
 */
export function setReference(doc: Document, args: { reference: Reference }): Document {
  return referenceProblem(doc, args.reference) ? doc : setSettings(doc, { reference: args.reference });
}

/** The point a shared-point reference names, with its label and pathway name, if the document has it. */
export function referencePoint(doc: Document, reference: Reference): { label: string; pathway: string } | null {
  if (reference.kind !== 'point') return null;
  const pathway = doc.pathways.find((p) => p.id === reference.pathway);
  const point = pathway?.points.find((p) => p.id === reference.point);
  return pathway && point ? { label: point.label || point.id, pathway: pathway.name || pathway.id } : null;
}

/**
 * When an edit took away the point the energies were measured from (deleting the point or
 * its pathway falls back to the document-wide zero, so the file stays loadable), the
 * sentence that tells the user so; null for every other edit.
 */
export function referenceFallback(before: Document, after: Document): string | null {
  const was = before.settings.reference;
  if (was.kind !== 'point' || after.settings.reference.kind === 'point' || referencePoint(after, was)) return null;
  const gone = referencePoint(before, was);
  const name = gone ? `“${gone.label}” (${gone.pathway})` : `“${was.point}”`;
  return `${name} was the reference point and is gone: energies are now measured from the document-wide zero. Undo brings both back.`;
}

/** What the energies are measured from, in a few words for a control ("“INT” (Catalysed)", "2 cat + sub"). */
export function referenceSummary(doc: Document, reference: Reference): string {
  switch (reference.kind) {
    case 'zero': return 'the document-wide zero';
    case 'first': return 'each pathway’s first point';
    case 'point': {
      const at = referencePoint(doc, reference);
      return at ? `“${at.label}” (${at.pathway})` : `a missing point “${reference.point}”`;
    }
    case 'species': {
      const labels = new Map(doc.species.map((s) => [s.id, s.label || s.id]));
      return reference.terms.map((t) => `${t.count === 1 ? '' : `${t.count} `}${labels.get(t.species) ?? t.species}`).join(' + ');
    }
  }
}
