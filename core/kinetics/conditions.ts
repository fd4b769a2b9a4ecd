import type { Finding } from '../profile/types.ts';
import type { KineticsOptions, Molecularity, StepMolecularity } from './types.ts';

/**
 * Checks the temperature and transmission coefficient a user gave; an empty list means usable.
 * κ above 1 is allowed (tunnelling corrections give κ > 1).
 */
export function checkConditions(options: KineticsOptions): Finding[] {
  const findings: Finding[] = [];
  const { temperatureK, transmission = 1 } = options;
  if (!Number.isFinite(temperatureK) || temperatureK <= 0) {
    findings.push({ severity: 'error', code: 'bad-temperature', message: `temperature must be a positive number of kelvin, got ${temperatureK}` });
  }
  if (!Number.isFinite(transmission) || transmission <= 0) {
    findings.push({ severity: 'error', code: 'bad-transmission', message: `transmission coefficient κ must be a positive number, got ${transmission}` });
  }
  return findings;
}

const DEFAULT_MOLECULARITY = Object.freeze({ forward: 1 as const, reverse: 1 as const, findings: Object.freeze([]) as unknown as Finding[] });

/** True for 1, 2 or 3. */
export function isMolecularity(value: unknown): value is Molecularity {
  return value === 1 || value === 2 || value === 3;
}

/**
 * Reads a step's molecularity entry; a value other than 1, 2 or 3 gives a finding and falls
 * back to 1 so the rest of the analysis still runs.
 */
export function readMolecularity(
  entry: StepMolecularity | undefined,
  where: { pathway: string; point: string },
): { forward: Molecularity; reverse: Molecularity; findings: Finding[] } {
  if (entry === undefined) return DEFAULT_MOLECULARITY;
  const raw = typeof entry === 'number' ? { forward: entry, reverse: 1 } : entry;
  const findings: Finding[] = [];
  const pick = (value: number, side: string): Molecularity => {
    if (isMolecularity(value)) return value;
    findings.push({ severity: 'error', code: 'bad-molecularity', message: `${side} molecularity of the step at "${where.point}" must be 1, 2 or 3, got ${value}; using 1`, ...where });
    return 1;
  };
  return { forward: pick(raw.forward, 'forward'), reverse: pick(raw.reverse, 'reverse'), findings };
}
