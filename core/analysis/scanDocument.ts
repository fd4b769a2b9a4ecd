import type { Document } from '../model/schema.ts';
import { analyseDocument } from './analyseDocument.ts';
import { spaced } from '../kinetics/temperatureScan.ts';

/** One series over temperature; null where the value cannot be had at that temperature. */
export interface ScanSeries {
  name: string;
  unit: string;
  values: (number | null)[];
}

/** Data for temperature plots: k of every step, K, TOF of cycles, product shares. */
export interface DocumentScan {
  temperaturesK: number[];
  series: ScanSeries[];
  /** How G(T) was obtained, per pathway. */
  approximations: string[];
}

/** Typed, stepwise and estimated energies do not change with T; species sums are re-resolved. */
function approximationOf(doc: Document, pathwayIndex: number): string {
  const pathway = doc.pathways[pathwayIndex]!;
  const fromSpecies = pathway.points.every((p) => p.energy.mode === 'species');
  return fromSpecies
    ? `${pathway.name}: every state re-resolved at each T (G = H − T·S from the thermal corrections, standard-state terms at T)`
    : `${pathway.name}: G values held at their input temperature; only k_BT/h and RT change`;
}

/**
 * Re-analyses the document at evenly spaced temperatures (inclusive). Species-based states
 * are resolved anew at each temperature, so their entropy terms follow T; typed values are
 * held, which is the usual approximation and is stated.
 */
export function scanDocument(doc: Document, startK: number, endK: number, count: number): DocumentScan {
  const temperaturesK = spaced({ startK, endK, count });
  const byName = new Map<string, ScanSeries>();
  const put = (name: string, unit: string, k: number, value: number | null) => {
    const series = byName.get(name) ?? { name, unit, values: new Array<number | null>(count).fill(null) };
    series.values[k] = value;
    byName.set(name, series);
  };
  temperaturesK.forEach((t, k) => {
    const analysis = analyseDocument({ ...doc, settings: { ...doc.settings, temperatureK: t } });
    for (const p of analysis.pathways) {
      for (const s of p.steps) {
        const step = `${p.pathway.name}: ${s.from.label} → ${s.to.label}`;
        put(`k ${step}`, s.unitForward, k, s.kForward);
        put(`K ${step}`, '1', k, s.equilibriumConstant);
      }
      if (p.energeticSpan) put(`TOF ${p.pathway.name}`, 's⁻¹', k, p.energeticSpan.tof);
    }
    for (const c of analysis.comparisons) {
      if (c.type === 'selectivity') for (const ch of c.result?.channels ?? []) put(`share ${ch.label}`, '%', k, ch.percent);
    }
  });
  return { temperaturesK, series: [...byName.values()], approximations: doc.pathways.map((_, i) => approximationOf(doc, i)) };
}
