import type { CalcRecord } from './calcRecord.ts';
import { geometryDeviation, SAME_GEOMETRY_TOLERANCE_A } from './geometryDeviation.ts';

/** A read output file: its name (as the user gave it) and the record. */
export interface CalcFile { name: string; record: CalcRecord }

/**
 * One species' files: where E comes from, and the frequency file for the corrections (may be
 * the same file), with notes on how they were put together (shown with the species' import notes).
 */
export interface CalcPair { energy: CalcFile; corrections: CalcFile | null; notes: string[] }

const TAG = /[-_.](sp|spe|single|singlepoint|energy|freq|frq|opt|optfreq|hess|hl|ll)$/i;

/** The species key of a file name: base name without extension and without a job tag ("int1_sp.out" → "int1"). */
export function speciesKey(name: string): string {
  const base = name.split(/[\\/]/).pop()!.replace(/\.[^.]+$/, '');
  return base.replace(TAG, '').toLowerCase();
}

const sameSpecies = (a: CalcRecord, b: CalcRecord) => a.formula === b.formula && a.charge === b.charge && a.multiplicity === b.multiplicity;
const hasFrequencies = (f: CalcFile) => f.record.frequencies !== null;
const isSinglePoint = (f: CalcFile) => !hasFrequencies(f) && f.record.energyHartree !== null;
const list = (files: readonly CalcFile[]) => files.map((f) => f.name).join(' and ');

/** Deviation in Å when the two are the same species at the same geometry (within the tolerance), else null. */
function sameGeometry(a: CalcFile, b: CalcFile): number | null {
  if (!sameSpecies(a.record, b.record) || !a.record.atoms || !b.record.atoms || a.record.formula === null) return null;
  const deviation = geometryDeviation(a.record.atoms, b.record.atoms);
  return deviation !== null && deviation <= SAME_GEOMETRY_TOLERANCE_A ? deviation : null;
}

/**
 * Groups files into species: a file with an energy and no frequencies (a single point) pairs
 * with a frequency file of the same species key — "int1_sp.out" with "int1_freq.log" — when
 * formula, charge and multiplicity agree; E then comes from the single point and the
 * corrections from the frequency file. Files the names leave unpaired pair by content: a
 * single point and a frequency file of the same formula, charge and multiplicity whose
 * geometries agree to {@link SAME_GEOMETRY_TOLERANCE_A} in every interatomic distance (so
 * whatever the orientation the programs chose), when each is the other's only match. Two or
 * more matches stay apart with a note, so a choice is never made for the user. Every other
 * file is a species of its own.
 */
export function pairCalcFiles(files: readonly CalcFile[]): CalcPair[] {
  const pairs: CalcPair[] = [];
  const used = new Set<CalcFile>();
  const notes = new Map<CalcFile, string[]>();
  const note = (f: CalcFile, text: string) => notes.set(f, [...(notes.get(f) ?? []), text]);
  const byKey = new Map<string, CalcFile[]>();
  for (const f of files) byKey.set(speciesKey(f.name), [...(byKey.get(speciesKey(f.name)) ?? []), f]);
  for (const group of byKey.values()) {
    const singlePoints = group.filter(isSinglePoint);
    const frequencies = group.filter(hasFrequencies);
    if (singlePoints.length === 1 && frequencies.length === 1 && sameSpecies(singlePoints[0]!.record, frequencies[0]!.record)) {
      pairs.push({ energy: singlePoints[0]!, corrections: frequencies[0]!, notes: [] });
      used.add(singlePoints[0]!).add(frequencies[0]!);
    }
  }
  const singlePoints = files.filter((f) => !used.has(f) && isSinglePoint(f));
  const frequencyFiles = files.filter((f) => !used.has(f) && hasFrequencies(f));
  const matches = new Map<CalcFile, { file: CalcFile; deviation: number }[]>();
  for (const sp of singlePoints) {
    for (const fr of frequencyFiles) {
      const deviation = sameGeometry(sp, fr);
      if (deviation === null) continue;
      matches.set(sp, [...(matches.get(sp) ?? []), { file: fr, deviation }]);
      matches.set(fr, [...(matches.get(fr) ?? []), { file: sp, deviation }]);
    }
  }
  for (const sp of singlePoints) {
    const found = matches.get(sp) ?? [];
    if (found.length === 0) continue;
    const fr = found[0]!.file;
    const back = matches.get(fr)!;
    if (found.length === 1 && back.length === 1) {
      const text = `${sp.name} and ${fr.name} paired by geometry (names differ): same formula, charge and multiplicity, and every interatomic distance agrees within ${SAME_GEOMETRY_TOLERANCE_A} Å (largest difference ${found[0]!.deviation.toFixed(6)} Å)`;
      pairs.push({ energy: sp, corrections: fr, notes: [text] });
      used.add(sp).add(fr);
    } else {
      const others = found.length > 1 ? found.map((m) => m.file) : back.map((m) => m.file).filter((f) => f !== sp);
      note(sp, found.length > 1
        ? `${sp.name}: not paired, the geometry matches ${list(others)}; rename the two that belong together (e.g. x_sp / x_freq) to pair them`
        : `${sp.name}: not paired with ${fr.name}, whose geometry also matches ${list(others)}; rename the two that belong together (e.g. x_sp / x_freq) to pair them`);
    }
  }
  for (const fr of frequencyFiles) {
    const found = matches.get(fr) ?? [];
    if (!used.has(fr) && found.length > 0) note(fr, `${fr.name}: not paired, the geometry matches ${list(found.map((m) => m.file))} and a choice is not made for you`);
  }
  for (const f of files) {
    if (!used.has(f)) pairs.push({ energy: f, corrections: hasFrequencies(f) ? f : null, notes: notes.get(f) ?? [] });
  }
  const order = new Map(files.map((f, i) => [f, i]));
  return pairs.sort((a, b) => order.get(a.energy)! - order.get(b.energy)!);
}
