import type { Document } from '../model/schema.ts';

/** Where the standard state of a document's k and K comes from. */
export type StandardStateBasis = 'converted' | 'formation' | 'gas' | 'given';

/** The basis of the document's k and K: settings conversion, formation data, gas-phase energies, or as given. */
export function standardStateBasis(doc: Document): StandardStateBasis {
  if (doc.settings.standardState !== 'as-computed') return 'converted';
  if (doc.pathways.some((p) => p.points.some((q) => q.energy.mode === 'formation'))) return 'formation';
  return doc.species.some((s) => s.phase === 'gas') ? 'gas' : 'given';
}

/** The standard state k and K refer to, from the document's settings (the `analyze` line "k and K: …"). */
export function rateStandardState(doc: Document): string {
  switch (standardStateBasis(doc)) {
    case 'converted': return `c° = 1 mol/L (energies corrected from ${doc.settings.standardState === '1atm-to-1M' ? '1 atm' : '1 bar'} per species); K and k of steps that change the number of species are in (mol/L) units`;
    case 'formation': return 'p° = 1 bar (standard formation data): K is a pressure-based constant and the (mol/L)-unit k of molecular steps holds only after conversion to c° = 1 mol/L';
    case 'gas': return 'as computed (gas-phase energies, usually 1 atm or 1 bar): the (mol/L)-unit k of molecular steps holds only after conversion to c° = 1 mol/L; choose a 1 mol/L standard state in the settings';
    case 'given': return 'as given: the standard state of the input energies; (mol/L)-unit k of molecular steps assume it is c° = 1 mol/L';
  }
}

/** The same standard state in a few words, for a k quoted inside a finding. */
export function rateStandardStateShort(doc: Document): string {
  switch (standardStateBasis(doc)) {
    case 'converted': return 'c° = 1 mol/L';
    case 'formation': return 'p° = 1 bar energies, not converted to c° = 1 mol/L';
    case 'gas': return 'as-computed gas-phase energies, not converted to c° = 1 mol/L';
    case 'given': return 'standard state of the input energies, taken as c° = 1 mol/L';
  }
}
