import { annotationFindings } from '../figure/annotationPlans.ts';
import type { Document } from '../model/schema.ts';
import type { Finding, ResolvedProfile, Severity } from '../profile/types.ts';

/**
 * Findings about what the figure cannot show, which the analysis does not report:
 * annotations naming pathways or points that are not drawn, and pathways without points
 * (an error when no pathway has any: the figure would be blank).
 */
export function documentFindings(doc: Document, profile: ResolvedProfile): Finding[] {
  const findings: Finding[] = [];
  const empty = doc.pathways.filter((p) => p.points.length === 0);
  if (doc.pathways.length === empty.length) {
    findings.push({ severity: 'error', code: 'no-points', message: doc.pathways.length === 0 ? 'the document has no pathways; there is nothing to draw' : 'no pathway has any points; there is nothing to draw' });
  } else {
    for (const p of empty) findings.push({ severity: 'warning', code: 'pathway-empty', message: `pathway "${p.name || p.id}" has no points; it is not drawn`, pathway: p.id });
  }
  return [...findings, ...annotationFindings(profile, doc)];
}

/** "2 errors, 1 warning" — the summary line's count of findings by severity. */
export function findingCounts(findings: readonly Finding[]): string {
  const count = (s: Severity) => findings.filter((f) => f.severity === s).length;
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return `${plural(count('error'), 'error')}, ${plural(count('warning'), 'warning')}, ${plural(count('info'), 'note')}`;
}
