import type { Document, EnergySpec, Estimate, SpeciesTerm } from '../../core/model/schema.ts';
import type { ResolvedPathway } from '../../core/profile/types.ts';
import { convertEnergy, fromJoulesPerMol, type EnergyUnit } from '../../core/units/energy.ts';
import { energyDecimals } from '../../core/format/energyDecimals.ts';

export type EnergyMode = EnergySpec['mode'];

/** How each energy mode is named in the mechanism panel. */
export const MODE_NAMES: Record<EnergyMode, string> = {
  value: 'typed value',
  step: 'step',
  barrier: 'barrier',
  species: 'species sum',
  formation: 'formation data',
  estimate: 'estimate',
};

/** Starting parameters of each estimate method (our choice of typical magnitudes). */
export const ESTIMATE_DEFAULTS: Record<Estimate['method'], Estimate> = {
  marcus: { method: 'marcus', lambda: 40, unit: 'kcal/mol' },
  bep: { method: 'bep', e0: 20, alpha: 0.5, unit: 'kcal/mol' },
  rateConstant: { method: 'rateConstant', k: 1, molecularity: 1 },
  halfLife: { method: 'halfLife', seconds: 3600 },
  eyringFit: { method: 'eyringFit', data: [{ temperatureK: 298.15, k: 1e-3 }, { temperatureK: 318.15, k: 1e-2 }] },
  arrhenius: { method: 'arrhenius', data: [{ temperatureK: 298.15, k: 1e-3 }, { temperatureK: 318.15, k: 1e-2 }] },
};

const round = (v: number, decimals: number) => Number(v.toFixed(decimals)) + 0;

/**
 * The energy a point gets when the user switches it to another mode, chosen so that its
 * level stays where it is wherever that can be worked out (value, step, barrier); or a
 * message saying what is missing (no species yet).
 */
export function switchMode(mode: EnergyMode, doc: Document, resolved: ResolvedPathway | undefined, index: number): EnergySpec | string {
  const { unit } = doc.settings;
  const decimals = energyDecimals(doc.settings, unit);
  const points = resolved?.points ?? [];
  const own = points[index]?.energyJ ?? null;
  let previousMin: number | null = null;
  for (let i = index - 1; i >= 0; i--) if (points[i]!.kind === 'min') { previousMin = points[i]!.energyJ; break; }
  const display = (j: number | null) => (j === null ? 0 : round(fromJoulesPerMol(j, unit), decimals));
  switch (mode) {
    case 'value': return { mode, value: display(own), unit };
    case 'step': case 'barrier':
      return { mode, value: own !== null && previousMin !== null ? display(own - previousMin) : 0, unit };
    case 'species': case 'formation': {
      const first = doc.species[0];
      if (!first) return 'add a species in the species sheet first';
      const terms: SpeciesTerm[] = doc.pathways.flatMap((p) => p.points).find((p) => p.id === points[index]?.id)?.composition ?? [{ species: first.id, count: 1 }];
      return { mode, terms };
    }
    case 'estimate': return { mode, estimate: ESTIMATE_DEFAULTS.marcus };
  }
}

/** "2 cat + sub" for species terms. */
export function termsText(terms: readonly SpeciesTerm[]): string {
  return terms.map((t) => (t.count === 1 ? t.species : `${t.count} ${t.species}`)).join(' + ');
}

/** Reads "2 cat + sub" against the known species ids (labels, in the same order, for hints); a message names the first bad part. */
export function readTerms(text: string, ids: readonly string[], labels?: readonly string[]): SpeciesTerm[] | string {
  const parts = text.split('+').map((p) => p.trim()).filter((p) => p !== '');
  if (parts.length === 0) return 'expected at least one species, e.g. "2 cat + sub"';
  const terms: SpeciesTerm[] = [];
  for (const part of parts) {
    const match = /^(?:(\d+(?:\.\d+)?)\s*(?:[×x*]\s*)?)?(\S+)$/.exec(part);
    if (!match) return `cannot read "${part}"; write a count then a species id, e.g. "2 cat"`;
    const count = match[1] ? Number(match[1]) : 1;
    const species = match[2]!;
    if (!ids.includes(species)) {
      const byLabel = labels?.findIndex((l) => l === species) ?? -1;
      if (byLabel >= 0) return `"${species}" is a label; write the species id "${ids[byLabel]}"`;
      return `no species with id "${species}" (known: ${ids.join(', ') || 'none'})`;
    }
    if (!(count > 0)) return `the count of ${species} must be positive`;
    terms.push({ species, count });
  }
  return terms;
}

/**
 * `value` in `from` re-expressed in `to`, so that a changed input unit keeps the energy
 * (80 kJ/mol becomes 19.12045889 kcal/mol, not 80 kcal/mol). Ten significant figures drop
 * the binary noise of the conversion factor and keep the energy to 1 part in 10⁹.
 */
export function convertInput(value: number, from: EnergyUnit, to: EnergyUnit): number {
  return Number(convertEnergy(value, from, to).toPrecision(10));
}

/** A typed energy in `unit` as kJ/mol, the unit of the energy bounds in core/model/bounds.ts. */
export const inKJ = (unit: EnergyUnit) => (value: number) => convertEnergy(value, unit, 'kJ/mol');

/**
 * `entry` with its unit changed to `unit` and each named energy in it (a value and its σ)
 * re-expressed by {@link convertInput}, so both keep the physical amount; an absent σ stays absent.
 */
export function withUnit<T extends { unit: EnergyUnit }>(entry: T, unit: EnergyUnit, keys: readonly (keyof T)[]): T {
  const next = { ...entry, unit };
  for (const key of keys) {
    const v = entry[key];
    if (typeof v === 'number') (next as Record<keyof T, unknown>)[key] = convertInput(v, entry.unit, unit);
  }
  return next;
}

/** `entry` with σ set, or without a σ key when `sigma` is undefined (the document keeps no empty field). */
export function withSigma<T extends object, K extends string>(entry: T, key: K, sigma: number | undefined): T {
  const next = { ...entry } as Record<string, unknown>;
  if (sigma === undefined) delete next[key]; else next[key] = sigma;
  return next as T;
}

/**
 * A typed value, step or barrier keeps its σ (in the new spec's unit) when the point switches
 * between those modes, as the user's number stays what it was; other modes carry their own σ.
 */
export function carrySigma(from: EnergySpec, to: EnergySpec): EnergySpec {
  const typed = (e: EnergySpec) => e.mode === 'value' || e.mode === 'step' || e.mode === 'barrier';
  if (!typed(from) || !typed(to) || !('sigma' in from) || from.sigma === undefined || !('unit' in to)) return to;
  return { ...to, sigma: convertInput(from.sigma, from.unit, to.unit) } as EnergySpec;
}
