import type { Finding } from '../types.ts';
import type { CheckInput } from './checkContext.ts';

/** A point without a label is drawn unlabelled and cannot be named in tables and analysis. */
export function checkEmptyLabels({ pathways }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  for (const pathway of pathways) {
    pathway.points.forEach((point, i) => {
      if (point.label.trim() !== '') return;
      findings.push({ severity: 'warning', code: 'empty-label', pathway: pathway.id, point: point.id,
        message: `point ${i + 1} of pathway "${pathway.name}" has no label: the figure draws it unlabelled and the analysis cannot name it` });
    });
  }
  return findings;
}
