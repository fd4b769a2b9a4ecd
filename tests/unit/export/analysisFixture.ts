import { analyseDocument } from '../../../core/analysis/analyseDocument.ts';
import { makeDocument } from '../../../core/model/load.ts';
import type { DocumentInput } from '../../../core/model/schema.ts';
import { analysisReport } from '../../../core/report/analysisReport.ts';

type Spec = [string, 'min' | 'ts', number];
const pathway = (id: string, name: string, cycle: boolean, pts: Spec[]) => ({
  id, name, cycle, points: pts.map(([label, kind, v], i) => ({ id: `${id}${i}`, label, kind, energy: { mode: 'value' as const, value: v, unit: 'kcal/mol' as const } })),
});

/** REFERENCE.md §6 cycle A (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011)) as a catalytic cycle, kcal/mol, 298.15 K. */
export const CYCLE_A: Spec[] = [['I1', 'min', 0], ['T1', 'ts', 12], ['I2', 'min', -6], ['T2', 'ts', 15], ['I3', 'min', -4.5], ['T3', 'ts', 16.5], ['I4', 'min', -3], ['T4', 'ts', 8], ['I1′', 'min', -2]];

/** Cycle A plus an invented thermal and catalysed pair (our numbers) with a rate comparison. */
export function analysedDocument(extra: Partial<DocumentInput> = {}) {
  const doc = makeDocument({
    title: 'Test report',
    pathways: [
      pathway('A', 'cycle A', true, CYCLE_A),
      pathway('th', 'thermal', false, [['R', 'min', 0], ['TS', 'ts', 27.6], ['P', 'min', -12.4]]),
      pathway('ca', 'catalysed', false, [['R', 'min', 0], ['TS1', 'ts', 14.2], ['P', 'min', -12.4]]),
    ],
    comparisons: [{ type: 'rate', baseline: 'th', candidate: 'ca' }],
    ...extra,
  });
  const analysis = analyseDocument(doc);
  return { doc, analysis, report: analysisReport(doc, analysis) };
}
