import { uniqueId } from '../../edit/uniqueId.ts';
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
  const taken = [...existingIds];
  const candidates = pairCalcFiles(read).map((pair) => {
    const id = uniqueId(speciesKey(pair.energy.name), taken);
    taken.push(id);
    return speciesFromCalc(pair, id, conditions);
  });
  for (const c of candidates) errors.push(...c.errors);
  if (files.length === 0) errors.push('no files given');
  return { candidates, errors, ok: errors.length === 0 };
}
