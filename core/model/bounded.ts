import './zodSetup.ts';
import * as z from 'zod';
import { convertEnergy, type EnergyUnit } from '../units/energy.ts';
import { describe } from './describe.ts';
import { BOUNDS, formatLimit, outsideHard, type BoundName } from './bounds.ts';

const typeError = (what: string) => (issue: { input: unknown }) => `expected a number${what}, got ${describe(issue.input)}`;

/**
 * A number inside the hard range of `BOUNDS[name]`; the message names the bound
 * ("temperature 1e12 K is outside 1 to 10000 K"). `what` qualifies the type error
 * (" in K").
 */
export function bounded(name: BoundName, what = '') {
  return z.number({ error: typeError(what) }).superRefine((value, ctx) => {
    const problem = outsideHard(name, value);
    if (problem) ctx.addIssue({ code: 'custom', message: problem, input: value });
  });
}

/** A whole number inside the hard range of `BOUNDS[name]`. */
export function boundedInt(name: BoundName) {
  return bounded(name).refine(Number.isInteger, { message: `expected a whole ${BOUNDS[name].what}` });
}

/** A string no longer than the `textLength` bound, with the length named when it is not. */
export function boundedText() {
  const max = BOUNDS.textLength.hard[1];
  return z.string().max(max, { error: (issue) => `text of ${(issue.input as string).length} characters is longer than the limit of ${max} characters` });
}

const round = (v: number) => formatLimit(Number(v.toPrecision(6)));

/**
 * Message for an energy `value` written in `unit` outside a bound given in kJ/mol, or null.
 * Compared in the user's unit, so a huge value never overflows in the conversion.
 */
export function energyOutsideHard(name: 'relativeEnergyKJ' | 'reorganisationKJ', value: number, unit: EnergyUnit): string | null {
  const b = BOUNDS[name];
  const [lo, hi] = b.hard.map((v) => convertEnergy(v, 'kJ/mol', unit)) as [number, number];
  if (value >= lo && value <= hi) return null;
  const inKJ = unit === 'kJ/mol' ? '' : ` (${formatLimit(b.hard[0])} to ${formatLimit(b.hard[1])} kJ/mol)`;
  return `${b.what} ${value} ${unit} is outside ${round(lo)} to ${round(hi)} ${unit}${inKJ}`;
}

/** Adds an issue at `key` when `obj[key]`, read in `obj.unit`, is outside the energy bound. */
export function checkEnergyField<K extends string>(name: 'relativeEnergyKJ' | 'reorganisationKJ', key: K) {
  return (obj: Record<K, number> & { unit: EnergyUnit }, ctx: z.RefinementCtx) => {
    const problem = energyOutsideHard(name, obj[key], obj.unit);
    if (problem) ctx.addIssue({ code: 'custom', message: problem, path: [key], input: obj[key] });
  };
}

/**
 * Adds an issue at `sigmaKey` when σ/value of a positive input (a rate constant, a half-life)
 * is outside the `relativeSigma` bound. A σ that is itself invalid is left to its own check.
 */
export function checkRelativeSigma<V extends string, S extends string>(valueKey: V, sigmaKey: S) {
  return (obj: Record<V, number> & Partial<Record<S, number>>, ctx: z.RefinementCtx) => {
    const sigma = obj[sigmaKey];
    const value = obj[valueKey];
    if (sigma === undefined || !(sigma >= 0) || !Number.isFinite(sigma) || !(value > 0)) return;
    const problem = outsideHard('relativeSigma', sigma / value);
    if (problem) ctx.addIssue({ code: 'custom', message: `${sigmaKey} ${sigma} with ${valueKey} ${value}: ${problem}`, path: [sigmaKey], input: sigma });
  };
}
