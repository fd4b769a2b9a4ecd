import type { Document } from '../model/schema.ts';
import { BOUNDS, outsideHard, type BoundName } from '../model/bounds.ts';
import { ENERGY_UNITS, parseEnergyUnit } from '../units/energy.ts';
import { CliError, EXIT_USAGE } from './io.ts';

/** Applies `--unit` and `--temperature` to a document's settings. */
export function applySettingOptions(doc: Document, options: { unit?: string | undefined; temperature?: string | undefined }): Document {
  let settings = doc.settings;
  if (options.unit !== undefined) {
    const unit = parseEnergyUnit(options.unit);
    if (!unit) throw new CliError(`--unit: unknown unit "${options.unit}"; use one of ${ENERGY_UNITS.join(', ')}`, EXIT_USAGE);
    settings = { ...settings, unit };
  }
  if (options.temperature !== undefined) {
    settings = { ...settings, temperatureK: boundedOption('temperature', options.temperature, 'temperatureK', settings.temperatureK) };
  }
  return settings === doc.settings ? doc : { ...doc, settings };
}

/**
 * Parses a number option inside the hard range of `BOUNDS[bound]` (the same table the
 * document schema uses), or fails with a usage error naming the option and the bound.
 */
export function boundedOption(name: string, text: string | undefined, bound: BoundName, fallback: number, whole = false): number {
  if (text === undefined) return fallback;
  const value = text.trim() === '' ? Number.NaN : Number(text);
  const b = BOUNDS[bound];
  if (Number.isNaN(value)) throw new CliError(`--${name}: expected a number${b.unit ? ` in ${b.unit}` : ''}, got "${text}"`, EXIT_USAGE);
  const problem = outsideHard(bound, value);
  if (problem) throw new CliError(`--${name}: ${problem}`, EXIT_USAGE);
  if (whole && !Number.isInteger(value)) throw new CliError(`--${name}: expected a whole ${b.what}, got "${text}"`, EXIT_USAGE);
  return value;
}
