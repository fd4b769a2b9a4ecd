import { BOUNDS } from './bounds.ts';
import { energyOutsideHard } from './bounded.ts';
import type { DocumentError } from './load.ts';
import type { Document } from './schema.ts';

/**
 * Limits that span more than one field: the number of points over all pathways (layout,
 * analysis and simulation are refused at once beyond it instead of running for minutes) and
 * text annotation heights, which are read in the document's display unit.
 */
export function documentLimits(doc: Document): DocumentError[] {
  const errors: DocumentError[] = [];
  const total = doc.pathways.reduce((n, p) => n + p.points.length, 0);
  const max = BOUNDS.pointCount.hard[1];
  if (total > max) {
    errors.push({ path: 'pathways', message: `the document has ${total} points; the limit is ${max} points over all pathways` });
  }
  doc.figure.annotations.forEach((a, i) => {
    if (a.type !== 'text') return;
    const problem = energyOutsideHard('relativeEnergyKJ', a.y, doc.settings.unit);
    if (problem) errors.push({ path: `figure.annotations[${i}].y`, message: problem });
  });
  return errors;
}
