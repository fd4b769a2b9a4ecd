import type { Finding, ResolvedPathway } from '../profile/types.ts';
import { competingPathways } from './compare.ts';
import { energeticSpan } from './energeticSpan.ts';
import { analyseSteps } from './stepKinetics.ts';
import { pathwayAtTemperature, type PointThermo } from './pathwayAtTemperature.ts';
import type { StepMolecularity } from './types.ts';

/** Temperatures from `startK` to `endK` inclusive, `count` evenly spaced values. */
export interface ScanRange {
  startK: number;
  endK: number;
  count: number;
}

/** What to scan: pathways, the range and optional per-pathway inputs keyed by pathway id, then point id. */
export interface ScanInput {
  pathways: readonly ResolvedPathway[];
  range: ScanRange;
  transmission?: number;
  molecularity?: Readonly<Record<string, Readonly<Record<string, StepMolecularity>>>>;
  /** ΔH and ΔS for every point of a pathway; without them its G values are held. */
  thermo?: Readonly<Record<string, Readonly<Record<string, PointThermo>>>>;
  /** Scan the Curtin–Hammett product shares of these pathway ids (at least two). */
  selectivity?: { pathways: readonly string[]; tsIds?: Readonly<Record<string, readonly string[]>> };
}

/** Series for one pathway; entries are null where a value cannot be had. */
export interface PathwayScan {
  id: string;
  name: string;
  /** How G(T) was obtained for this pathway. */
  approximation: string;
  steps: { index: number; label: string; kForward: (number | null)[]; kReverse: (number | null)[]; equilibriumConstant: (number | null)[] }[];
  /** TOF per temperature for cycles, else null. */
  tof: (number | null)[] | null;
}

/** Plain arrays for plotting against `temperaturesK`. */
export interface TemperatureScan {
  temperaturesK: number[];
  pathways: PathwayScan[];
  selectivity: { id: string; label: string; percent: (number | null)[] }[] | null;
  findings: Finding[];
}

/** Approximation statement when G values are held while T changes. */
export const HELD_G = 'G values held at their input temperature; only k_BT/h and RT change';
/** Statement when G(T) comes from per-point ΔH and ΔS. */
export const G_FROM_H_S = 'G(T) = H − T·S from the given ΔH and ΔS of every point (ΔH and ΔS taken constant)';

/**
 * Rate constants, K, TOF and selectivity over a temperature range. Each temperature re-runs
 * the step, span and selectivity analyses on the pathway's G(T); findings are those of the
 * first temperature plus input problems.
 */
export function temperatureScan(input: ScanInput): TemperatureScan {
  const findings = checkRange(input.range);
  if (findings.length > 0) return { temperaturesK: [], pathways: [], selectivity: null, findings };
  const temperaturesK = spaced(input.range);
  const perT = temperaturesK.map((t) => input.pathways.map((p) => atTemperature(p, t, input, findings)));
  const pathways = input.pathways.map((p, k) => scanOne(p, temperaturesK, perT.map((row) => row[k]!), input, findings));
  return { temperaturesK, pathways, selectivity: scanSelectivity(input, temperaturesK, perT, findings), findings };
}

function checkRange({ startK, endK, count }: ScanRange): Finding[] {
  const ok = (t: number) => Number.isFinite(t) && t > 0;
  if (!ok(startK) || !ok(endK)) return [{ severity: 'error', code: 'bad-temperature', message: `scan temperatures must be positive kelvin, got ${startK} to ${endK}` }];
  if (!Number.isInteger(count) || count < 1) return [{ severity: 'error', code: 'bad-scan-count', message: `scan count must be a whole number ≥ 1, got ${count}` }];
  return [];
}

/** `count` evenly spaced temperatures from `startK` to `endK` inclusive (just `startK` when count is 1). */
export function spaced({ startK, endK, count }: ScanRange): number[] {
  return Array.from({ length: count }, (_, i) => (count === 1 ? startK : startK + ((endK - startK) * i) / (count - 1)));
}

function atTemperature(p: ResolvedPathway, t: number, input: ScanInput, findings: Finding[]): ResolvedPathway {
  const r = pathwayAtTemperature(p, t, input.thermo?.[p.id]);
  if (t === input.range.startK) findings.push(...r.findings);
  return r.pathway;
}

function scanOne(p: ResolvedPathway, temps: number[], variants: ResolvedPathway[], input: ScanInput, findings: Finding[]): PathwayScan {
  const runs = variants.map((v, i) => analyseSteps(v, { temperatureK: temps[i]!, transmission: input.transmission, molecularity: input.molecularity?.[p.id] }));
  findings.push(...(runs[0]?.findings ?? []));
  const steps = (runs[0]?.steps ?? []).map((s, k) => ({
    index: s.index,
    label: `${s.from.label} → ${s.to.label}`,
    kForward: runs.map((r) => r.steps[k]?.kForward ?? null),
    kReverse: runs.map((r) => r.steps[k]?.kReverse ?? null),
    equilibriumConstant: runs.map((r) => r.steps[k]?.equilibriumConstant ?? null),
  }));
  let tof: (number | null)[] | null = null;
  if (p.cycle) {
    const spans = variants.map((v, i) => energeticSpan(v, { temperatureK: temps[i]!, transmission: input.transmission }));
    findings.push(...(spans[0]?.findings ?? []).filter((f) => f.code !== 'ts-below-neighbour'));
    tof = spans.map((s) => s.span?.tof ?? null);
  }
  const held = variants.every((v) => v === p);
  return { id: p.id, name: p.name, approximation: held ? HELD_G : G_FROM_H_S, steps, tof };
}

function scanSelectivity(input: ScanInput, temps: number[], perT: ResolvedPathway[][], findings: Finding[]): TemperatureScan['selectivity'] {
  const wanted = input.selectivity;
  if (wanted === undefined) return null;
  const index = wanted.pathways.map((id) => input.pathways.findIndex((p) => p.id === id));
  const missing = wanted.pathways.filter((_, k) => index[k]! < 0);
  if (missing.length > 0 || index.length < 2) {
    findings.push({ severity: 'error', code: 'bad-selectivity', message: `selectivity needs at least two known pathway ids; unknown: ${missing.join(', ') || 'none'}` });
    return null;
  }
  const runs = perT.map((row, i) => competingPathways(index.map((k) => row[k]!), temps[i]!, wanted.tsIds));
  findings.push(...(runs[0]?.findings ?? []).filter((f) => f.code !== 'ts-below-neighbour'));
  return index.map((k) => {
    const p = input.pathways[k]!;
    return { id: p.id, label: p.name, percent: runs.map((r) => r.result?.channels.find((c) => c.id === p.id)?.percent ?? null) };
  });
}
