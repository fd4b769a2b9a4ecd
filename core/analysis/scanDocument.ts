import type { Document } from '../model/schema.ts';
import { analyseDocument } from './analyseDocument.ts';
import { spaced } from '../kinetics/temperatureScan.ts';
import { formationRoute } from '../profile/formationSum.ts';

/** What a series holds: forward rate constants, equilibrium constants, cycle TOF or product shares. */
export type ScanKind = 'k' | 'K' | 'TOF' | 'share';

/** One series over temperature; null where the value cannot be had at that temperature. */
export interface ScanSeries {
  /** Unique name, e.g. "k Thermal: AE → LC" (the CLI's column header). */
  name: string;
  kind: ScanKind;
  /** The pathway it belongs to (id); absent for product shares, which span pathways. */
  pathway?: string;
  /** The step, pathway or product it is about, for a plot legend ("AE → LC"). */
  label: string;
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

/**
 * Typed, stepwise and estimated energies do not change with T; species sums are re-resolved;
 * formation-data states follow ΔfH° − T·S° when the document has ΔfH° and S° for them.
 */
function approximationOf(doc: Document, pathwayIndex: number): string {
  const pathway = doc.pathways[pathwayIndex]!;
  const modes = new Set(pathway.points.map((p) => p.energy.mode));
  const followsT = doc.settings.quantity === 'G' && modes.has('formation') && formationRoute(doc) === 'dH-TS';
  if (modes.size === 1 && modes.has('species')) return `${pathway.name}: every state re-resolved at each T (G = H − T·S from the thermal corrections, standard-state terms at T)`;
  if (modes.size === 1 && followsT) return `${pathway.name}: every state re-resolved at each T (G = Σ(ΔfH° − T·S°) from 298.15 K formation data, ΔrH° and ΔrS° taken constant)`;
  if (modes.has('species') || followsT) return `${pathway.name}: species and formation-data states re-resolved at each T; typed and stepwise values held at their input temperature`;
  return `${pathway.name}: G values held at their input temperature; only k_BT/h and RT change`;
}

/**
 * Re-analyses the document at evenly spaced temperatures (inclusive). Species-based states
 * are resolved anew at each temperature, so their entropy terms follow T; typed values are
 * held, which is the usual approximation and is stated.
 */
export function scanDocument(doc: Document, startK: number, endK: number, count: number, onProgress?: (done: number, total: number) => void): DocumentScan {
  const temperaturesK = spaced({ startK, endK, count });
  const byName = new Map<string, ScanSeries>();
  const put = (about: Omit<ScanSeries, 'values'>, k: number, value: number | null) => {
    const series = byName.get(about.name) ?? { ...about, values: new Array<number | null>(count).fill(null) };
    series.values[k] = value;
    byName.set(about.name, series);
  };
  temperaturesK.forEach((t, k) => {
    const analysis = analyseDocument({ ...doc, settings: { ...doc.settings, temperatureK: t } });
    onProgress?.(k + 1, count);
    for (const p of analysis.pathways) {
      const pathway = p.pathway.id;
      for (const s of p.steps) {
        const label = `${s.from.label} → ${s.to.label}`;
        put({ name: `k ${p.pathway.name}: ${label}`, kind: 'k', pathway, label, unit: s.unitForward }, k, s.kForward);
        put({ name: `K ${p.pathway.name}: ${label}`, kind: 'K', pathway, label, unit: '1' }, k, s.equilibriumConstant);
      }
      if (p.energeticSpan) put({ name: `TOF ${p.pathway.name}`, kind: 'TOF', pathway, label: p.pathway.name, unit: 's⁻¹' }, k, p.energeticSpan.tof);
    }
    for (const c of analysis.comparisons) {
      if (c.type === 'selectivity') for (const ch of c.result?.channels ?? []) put({ name: `share ${ch.label}`, kind: 'share', label: ch.label, unit: '%' }, k, ch.percent);
    }
  });
  return { temperaturesK, series: [...byName.values()], approximations: doc.pathways.map((_, i) => approximationOf(doc, i)) };
}
