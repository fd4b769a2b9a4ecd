import { rateUnit, type RateUnit } from '../kinetics/eyring.ts';
import type { Molecularity } from '../kinetics/types.ts';
import type { Document, Unit } from '../model/schema.ts';
import { toJoulesPerMol, unitLabel } from '../units/energy.ts';
import { rtJoules } from '../units/thermal.ts';

/** Where a sampled deviation is added in the document. */
export type InputTarget =
  | { kind: 'point'; pathway: number; point: number; field: 'value' | 'lambda' | 'e0' | 'k' | 'seconds' }
  /** The k of point `index` of an Eyring-plot or Arrhenius estimate's data. */
  | { kind: 'ratePoint'; pathway: number; point: number; index: number }
  | { kind: 'structure'; species: number; structure: number; field: 'energy' | 'correction' }
  | { kind: 'species'; species: number }
  | { kind: 'formation'; species: number; field: 'dfH' | 'dfG' };

/** One entered number with a standard uncertainty: the inputs the Monte Carlo perturbs. */
export interface UncertainInput {
  /** Stable key, e.g. "cycle/T3/value" or "species cat/energy". */
  key: string;
  /** What a chemist reads, e.g. "T3: barrier". */
  label: string;
  /** σ in the unit the value was entered in. */
  sigma: number;
  /** An energy unit, or a rate constant's or half-life's own unit. */
  unit: Unit | RateUnit | 's';
  /**
   * σ as an energy in J/mol: σ itself for an energy; for a rate constant or half-life, RT·σ/value,
   * the σ of the −RT ln k (or RT ln t½) it enters the Eyring equation as (RT at its temperature).
   */
  sigmaJ: number;
  /**
   * How a deviate is applied: 'normal' adds z·σ; 'logNormal' (rate constants, half-lives, which
   * must stay positive) multiplies by exp(z·σ/value), see `perturbDocument`.
   */
  distribution: 'normal' | 'logNormal';
  /** True when σ is the document's default, not one typed beside the value. */
  isDefault: boolean;
  target: InputTarget;
}

const make = (key: string, label: string, sigma: number, unit: Unit, isDefault: boolean, target: InputTarget): UncertainInput =>
  ({ key, label, sigma, unit, sigmaJ: toJoulesPerMol(sigma, unit), distribution: 'normal', isDefault, target });

/** A positive input (k, t½) with σ in its own unit, sampled log-normally. */
const makePositive = (key: string, label: string, sigma: number, value: number, unit: RateUnit | 's', temperatureK: number, target: InputTarget): UncertainInput =>
  ({ key, label, sigma, unit, sigmaJ: rtJoules(temperatureK) * (sigma / value), distribution: 'logNormal', isDefault: false, target });

/** Is point `qi` of pathway `pi` a reference state (its typed value defines zero)? */
function isReference(doc: Document, pi: number, qi: number): boolean {
  const ref = doc.settings.reference;
  if (ref.kind === 'first') return qi === 0;
  if (ref.kind === 'point') return doc.pathways[pi]!.id === ref.pathway && doc.pathways[pi]!.points[qi]!.id === ref.point;
  // One document-wide zero: a pathway's first state typed as 0 is where that zero sits.
  const energy = doc.pathways[pi]!.points[qi]!.energy;
  return ref.kind === 'zero' && qi === 0 && energy?.mode === 'value' && energy.value === 0;
}

/**
 * Every uncertain input of a document, in a fixed order (so a seed gives the same samples).
 * σ attaches to what was entered, so correlations follow by construction: a species shared by
 * two states moves both; a step's σ moves every later point resolved from it. The document's
 * default σ (settings.uncertainty.defaultSigma, off unless stated) applies to typed values
 * (not a reference state's, which defines zero), steps, barriers, each species' energy as a
 * whole, and formation values that carry no σ of their own; estimates only take explicit σ.
 * Rate constants and half-lives (estimates and the (T, k) points of fits) are positive and
 * listed as log-normal inputs.
 */
export function uncertainInputs(doc: Document): UncertainInput[] {
  const out: UncertainInput[] = [];
  const u = doc.settings.uncertainty;
  const fallback = u?.defaultSigma !== undefined && u.defaultSigma > 0 ? { sigma: u.defaultSigma, unit: u.defaultSigmaUnit } : null;
  const kj = 'kJ/mol' as const;
  const hartreeFallback = fallback && toJoulesPerMol(fallback.sigma, fallback.unit) / toJoulesPerMol(1, 'hartree');
  const kjFallback = fallback && toJoulesPerMol(fallback.sigma, fallback.unit) / 1000;
  doc.pathways.forEach((pathway, pi) => pathway.points.forEach((point, qi) => {
    const e = point.energy;
    const key = `${pathway.id}/${point.id}`;
    const name = `${point.label || point.id} (${pathway.name || pathway.id})`;
    const target = (field: 'value' | 'lambda' | 'e0' | 'k' | 'seconds'): InputTarget => ({ kind: 'point', pathway: pi, point: qi, field });
    if (e.mode === 'value' || e.mode === 'step' || e.mode === 'barrier') {
      const what = e.mode === 'value' ? 'typed value' : e.mode;
      if (e.sigma !== undefined && e.sigma > 0) out.push(make(`${key}/value`, `${name}: ${what}`, e.sigma, e.unit, false, target('value')));
      else if (e.sigma === undefined && fallback && !(e.mode === 'value' && isReference(doc, pi, qi))) {
        out.push(make(`${key}/value`, `${name}: ${what}`, fallback.sigma, fallback.unit, true, target('value')));
      }
    } else if (e.mode === 'estimate') {
      const est = e.estimate;
      if (est.method === 'marcus' && est.lambdaSigma) out.push(make(`${key}/lambda`, `${name}: Marcus λ`, est.lambdaSigma, est.unit, false, target('lambda')));
      if (est.method === 'bep' && est.e0Sigma) out.push(make(`${key}/e0`, `${name}: BEP E₀`, est.e0Sigma, est.unit, false, target('e0')));
      const tData = (est.method === 'rateConstant' || est.method === 'halfLife' ? est.temperatureK : undefined) ?? doc.settings.temperatureK;
      if (est.method === 'rateConstant' && est.kSigma) out.push(makePositive(`${key}/k`, `${name}: rate constant k`, est.kSigma, est.k, rateUnit(est.molecularity as Molecularity), tData, target('k')));
      if (est.method === 'halfLife' && est.secondsSigma) out.push(makePositive(`${key}/seconds`, `${name}: half-life`, est.secondsSigma, est.seconds, 's', tData, target('seconds')));
      if (est.method === 'eyringFit' || est.method === 'arrhenius') {
        est.data.forEach((p, index) => {
          if (p.kSigma) out.push(makePositive(`${key}/data ${index}/k`, `${name}: k at ${p.temperatureK} K`, p.kSigma, p.k, 's⁻¹', p.temperatureK, { kind: 'ratePoint', pathway: pi, point: qi, index }));
        });
      }
    }
  }));
  doc.species.forEach((species, si) => {
    const name = species.label || species.id;
    let explicit = false;
    species.structures.forEach((s, ti) => {
      const which = species.structures.length > 1 ? ` conformer ${ti + 1}` : '';
      if (s.sigma !== undefined) explicit = true;
      if (s.correctionSigma !== undefined) explicit = true;
      if (s.sigma) out.push(make(`species ${species.id}/${ti}/energy`, `${name}${which}: energy`, s.sigma, 'hartree', false, { kind: 'structure', species: si, structure: ti, field: 'energy' }));
      if (s.correctionSigma) out.push(make(`species ${species.id}/${ti}/correction`, `${name}${which}: thermal correction`, s.correctionSigma, 'hartree', false, { kind: 'structure', species: si, structure: ti, field: 'correction' }));
    });
    if (!explicit && hartreeFallback && species.structures.length > 0) {
      out.push(make(`species ${species.id}/energy`, `${name}: energy`, hartreeFallback, 'hartree', true, { kind: 'species', species: si }));
    }
    const f = species.formation;
    for (const field of ['dfH', 'dfG'] as const) {
      if (f?.[field] === undefined) continue;
      const given = f[`${field}Sigma`];
      const symbol = field === 'dfH' ? 'ΔfH°' : 'ΔfG°';
      if (given) out.push(make(`species ${species.id}/${field}`, `${name}: ${symbol}`, given, kj, false, { kind: 'formation', species: si, field }));
      else if (given === undefined && kjFallback) out.push(make(`species ${species.id}/${field}`, `${name}: ${symbol}`, kjFallback, kj, true, { kind: 'formation', species: si, field }));
    }
  });
  return out;
}

/** How an input's unit is written: an energy unit's label, or a rate constant's or half-life's unit as it is. */
export function sigmaUnitLabel(unit: string): string {
  return unit === 's' || unit.includes('s⁻¹') ? unit : unitLabel(unit as Unit);
}

/** "σ 1.0 kcal/mol" for messages. */
export function describeSigma(input: UncertainInput): string {
  return `σ ${input.sigma} ${sigmaUnitLabel(input.unit)}${input.isDefault ? ' (default)' : ''}`;
}
