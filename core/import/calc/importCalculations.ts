import { readCalculation } from './readCalculation.ts';
import { pairCalcFiles, speciesKey, type CalcFile } from './pairCalcFiles.ts';
import { speciesFromCalc, type CalcConditions, type SpeciesCandidate } from './speciesFromCalc.ts';

/** Result of {@link importCalculations}: every species candidate, plus files that could not be read at all. */
export interface CalcImport {
  candidates: SpeciesCandidate[];
  /** Files that are none of the formats read, or candidates that cannot be species; any error blocks the import. */
  errors: string[];
  /** True when nothing blocks adding all candidates (all or nothing). */
  ok: boolean;
}

function uniqueId(base: string, taken: Set<string>): string {
  const clean = base.replace(/[^A-Za-z0-9_-]+/g, '-').replace(/^-+|-+$/g, '') || 'species';
  let id = clean;
  for (let n = 2; taken.has(id); n++) id = `${clean}-${n}`;
  taken.add(id);
  return id;
}

/**
 * Reads many output files at once into species candidates for the review table: one species
 * per file or per single-point + frequency pair, ids from the file names (unique against
 * `existingIds`). Pure: the texts are given, nothing is read from disk here.
 */
export function importCalculations(files: readonly { name: string; text: string }[], conditions: CalcConditions, existingIds: readonly string[] = []): CalcImport {
  const errors: string[] = [];
  const read: CalcFile[] = [];
  for (const f of files) {
    const result = readCalculation(f.text, f.name);
    if (result.ok) read.push({ name: f.name, record: result.record });
    else errors.push(result.message);
  }
  const taken = new Set(existingIds);
  const candidates = pairCalcFiles(read).map((pair) => speciesFromCalc(pair, uniqueId(speciesKey(pair.energy.name), taken), conditions));
  for (const c of candidates) errors.push(...c.errors);
  if (files.length === 0) errors.push('no files given');
  return { candidates, errors, ok: errors.length === 0 };
}
