import type { Document } from '../../core/model/schema.ts';
import { uncertainInputs } from '../../core/uncertainty/uncertainInputs.ts';
import { convertEnergy, unitLabel, type EnergyUnit } from '../../core/units/energy.ts';

/** What an empty σ field shows: a short placeholder and the hint on hover. */
export interface SigmaHint {
  placeholder: string;
  title: string;
}

const defaulted = new WeakMap<Document, ReadonlySet<string>>();

/** Keys (as core/uncertainty names its inputs) of the entered energies that take the document's default σ. */
function defaultedKeys(doc: Document): ReadonlySet<string> {
  let keys = defaulted.get(doc);
  if (!keys) {
    keys = new Set(uncertainInputs(doc).filter((i) => i.isDefault).map((i) => i.key));
    defaulted.set(doc, keys);
  }
  return keys;
}

// Two figures: the placeholder must fit a four-digit field; the hint gives the default exactly.
const short = (v: number) => String(Number(v.toPrecision(2)));

/**
 * The hint of the σ field beside an entered energy in `unit`: with `key` among the inputs the
 * document's default σ applies to, the placeholder shows that default in the field's unit in
 * brackets; otherwise "σ". Empty means no σ of its own; 0 means taken as exact.
 */
export function sigmaHint(doc: Document, unit: EnergyUnit, key: string): SigmaHint {
  const u = doc.settings.uncertainty;
  const what = `Standard uncertainty σ in ${unitLabel(unit)}; 0 takes the value as exact.`;
  if (u?.defaultSigma !== undefined && defaultedKeys(doc).has(key)) {
    const given = `${u.defaultSigma} ${unitLabel(u.defaultSigmaUnit)}`;
    return { placeholder: `(${short(convertEnergy(u.defaultSigma, u.defaultSigmaUnit, unit))})`, title: `${what} Empty: the document's default σ (${given}) applies.` };
  }
  const why = u?.defaultSigma ? 'the document default σ does not apply here' : 'no document default σ is set';
  return { placeholder: 'σ', title: `${what} Empty: no σ (${why}).` };
}
