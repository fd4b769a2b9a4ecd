import type { Document } from '../model/schema.ts';
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
    const t = Number(options.temperature);
    if (!Number.isFinite(t) || t <= 0) throw new CliError(`--temperature: expected a positive number of kelvin, got "${options.temperature}"`, EXIT_USAGE);
    settings = { ...settings, temperatureK: t };
  }
  return settings === doc.settings ? doc : { ...doc, settings };
}

/** Parses a positive number option or fails with a usage error naming it. */
export function positiveOption(name: string, text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback;
  const value = Number(text);
  if (!Number.isFinite(value) || value <= 0) throw new CliError(`--${name}: expected a positive number, got "${text}"`, EXIT_USAGE);
  return value;
}
