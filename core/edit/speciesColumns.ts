import type { Species } from '../model/schema.ts';

/** A column of the species sheet: what it is called, its unit, and whether it holds a number. */
export interface SpeciesColumn {
  key: SpeciesColumnKey;
  title: string;
  unit: string | null;
  numeric: boolean;
  /** A σ column: the column whose standard uncertainty it holds, in that column's unit. */
  sigmaOf?: SpeciesColumnKey;
}

export type SpeciesColumnKey =
  | 'id' | 'label' | 'formula' | 'charge' | 'phase'
  | 'electronic' | 'singlePoint' | 'hCorrection' | 'gCorrection'
  | 'dfH' | 'S' | 'dfG'
  | 'sigma' | 'correctionSigma' | 'dfHSigma' | 'dfGSigma';

/** The sheet's columns in order (a pasted block without a header fills them in this order). */
export const SPECIES_COLUMNS: readonly SpeciesColumn[] = [
  { key: 'id', title: 'Id', unit: null, numeric: false },
  { key: 'label', title: 'Label', unit: null, numeric: false },
  { key: 'formula', title: 'Formula', unit: null, numeric: false },
  { key: 'charge', title: 'Charge', unit: null, numeric: true },
  { key: 'phase', title: 'Phase', unit: null, numeric: false },
  { key: 'electronic', title: 'E', unit: 'Eh', numeric: true },
  { key: 'singlePoint', title: 'E (single point)', unit: 'Eh', numeric: true },
  { key: 'hCorrection', title: 'H correction', unit: 'Eh', numeric: true },
  { key: 'gCorrection', title: 'G correction', unit: 'Eh', numeric: true },
  { key: 'dfH', title: 'ΔfH°', unit: 'kJ/mol', numeric: true },
  { key: 'S', title: 'S°', unit: 'J/(mol K)', numeric: true },
  { key: 'dfG', title: 'ΔfG°', unit: 'kJ/mol', numeric: true },
  // σ columns last, so a block pasted without a header still fills the columns above in order.
  { key: 'sigma', title: 'σ(E)', unit: 'Eh', numeric: true, sigmaOf: 'electronic' },
  { key: 'correctionSigma', title: 'σ(correction)', unit: 'Eh', numeric: true, sigmaOf: 'gCorrection' },
  { key: 'dfHSigma', title: 'σ(ΔfH°)', unit: 'kJ/mol', numeric: true, sigmaOf: 'dfH' },
  { key: 'dfGSigma', title: 'σ(ΔfG°)', unit: 'kJ/mol', numeric: true, sigmaOf: 'dfG' },
];

/** Flat text cells of one species, as the sheet shows them (first conformer only). */
export type SpeciesRow = Record<SpeciesColumnKey, string>;

const text = (v: number | undefined) => (v === undefined ? '' : String(v));

/** The cells of a species. */
export function speciesRow(s: Species): SpeciesRow {
  const first = s.structures[0];
  return {
    id: s.id, label: s.label, formula: s.formula ?? '', charge: text(s.charge), phase: s.phase,
    electronic: text(first?.electronic), singlePoint: text(first?.singlePoint),
    hCorrection: text(first?.hCorrection), gCorrection: text(first?.gCorrection),
    dfH: text(s.formation?.dfH), S: text(s.formation?.S), dfG: text(s.formation?.dfG),
    sigma: text(first?.sigma), correctionSigma: text(first?.correctionSigma),
    dfHSigma: text(s.formation?.dfHSigma), dfGSigma: text(s.formation?.dfGSigma),
  };
}

/** Finds a column by key or by title as a person might write it in a header ("G correction", "gcorrection"). */
export function columnByName(name: string): SpeciesColumn | undefined {
  const squash = (v: string) => v.toLowerCase().replace(/[\s_°()-]/g, '');
  const wanted = squash(name.replace(/\[.*\]$/, '').replace(/\/.*$/, ''));
  return SPECIES_COLUMNS.find((c) => squash(c.key) === wanted || squash(c.title) === wanted);
}
