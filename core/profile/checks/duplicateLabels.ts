import type { Finding } from '../types.ts';
import type { CheckInput } from './checkContext.ts';

/** Two points in one pathway with the same label make tables and figures ambiguous. */
export function checkDuplicateLabels({ pathways }: CheckInput): Finding[] {
  const findings: Finding[] = [];
  for (const pathway of pathways) {
    const seen = new Map<string, string>();
    const last = pathway.points.length - 1;
    pathway.points.forEach((point, i) => {
      const key = point.label.trim();
      // A cycle may repeat its first label on the regenerated last state.
      if (pathway.cycle && i === last && key === pathway.points[0]?.label.trim()) return;
      if (seen.has(key)) {
        findings.push({ severity: 'warning', code: 'duplicate-label', pathway: pathway.id, point: point.id, message: `label "${point.label}" is used twice in pathway "${pathway.name}"` });
      } else seen.set(key, point.id);
    });
  }
  return findings;
}
