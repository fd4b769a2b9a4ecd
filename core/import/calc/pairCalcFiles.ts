import type { CalcRecord } from './calcRecord.ts';

/** A read output file: its name (as the user gave it) and the record. */
export interface CalcFile { name: string; record: CalcRecord }

/** One species' files: where E comes from, and the frequency file for the corrections (may be the same file). */
export interface CalcPair { energy: CalcFile; corrections: CalcFile | null }

const TAG = /[-_.](sp|spe|single|singlepoint|energy|freq|frq|opt|optfreq|hess|hl|ll)$/i;

/** The species key of a file name: base name without extension and without a job tag ("int1_sp.out" → "int1"). */
export function speciesKey(name: string): string {
  const base = name.split(/[\\/]/).pop()!.replace(/\.[^.]+$/, '');
  return base.replace(TAG, '').toLowerCase();
}

const sameSpecies = (a: CalcRecord, b: CalcRecord) => a.formula === b.formula && a.charge === b.charge && a.multiplicity === b.multiplicity;
const hasFrequencies = (f: CalcFile) => f.record.frequencies !== null;

/**
 * Groups files into species: a file with an energy and no frequencies (a single point) pairs
 * with a frequency file of the same species key — "int1_sp.out" with "int1_freq.log" — when
 * formula, charge and multiplicity agree; E then comes from the single point and the
 * corrections from the frequency file. Every other file is a species of its own.
 */
export function pairCalcFiles(files: readonly CalcFile[]): CalcPair[] {
  const pairs: CalcPair[] = [];
  const used = new Set<CalcFile>();
  const byKey = new Map<string, CalcFile[]>();
  for (const f of files) byKey.set(speciesKey(f.name), [...(byKey.get(speciesKey(f.name)) ?? []), f]);
  for (const group of byKey.values()) {
    const singlePoints = group.filter((f) => !hasFrequencies(f) && f.record.energyHartree !== null);
    const frequencies = group.filter(hasFrequencies);
    if (singlePoints.length === 1 && frequencies.length === 1 && sameSpecies(singlePoints[0]!.record, frequencies[0]!.record)) {
      pairs.push({ energy: singlePoints[0]!, corrections: frequencies[0]! });
      used.add(singlePoints[0]!).add(frequencies[0]!);
    }
  }
  for (const f of files) {
    if (!used.has(f)) pairs.push({ energy: f, corrections: hasFrequencies(f) ? f : null });
  }
  const order = new Map(files.map((f, i) => [f, i]));
  return pairs.sort((a, b) => order.get(a.energy)! - order.get(b.energy)!);
}
