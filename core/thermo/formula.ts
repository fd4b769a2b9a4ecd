import type { Composition } from './composition.ts';
import type { FormulaError } from './formulaError.ts';
import { formulaError } from './formulaError.ts';
import { parseFormulaBody } from './formulaBody.ts';
import { splitFormulaSuffix, type Phase } from './formulaSuffix.ts';

export type { Composition, CompositionComparison, ElementDifference } from './composition.ts';
export { compareCompositions, describeComparison, sumCompositions } from './composition.ts';
export type { FormulaError } from './formulaError.ts';
export type { Phase } from './formulaSuffix.ts';

/** A parsed formula: element counts, net charge, the phase written after it. */
export interface ParsedFormula extends Composition {
  phase: Phase | null;
  /** How ambiguous notation was read (e.g. "Fe2+" as Fe²⁺), for the user to confirm. */
  notes: string[];
}

/** Result of {@link parseFormula}: the formula, or an error naming the position and text. */
export type FormulaResult = { ok: true; value: ParsedFormula } | { ok: false; error: FormulaError };

/** Options for {@link parseFormula}. */
export interface FormulaOptions {
  /** Charge given separately (e.g. a species' charge field); must agree with a written one. */
  charge?: number;
}

/**
 * Parses a chemical formula into element counts, charge and phase: `Ca(OH)2`,
 * `[Pd(PPh3)2]`, `K4[Fe(CN)6]`, `CuSO4·5H2O`, `NH4^+`, `SO4^2-`, `Cl-(aq)`, `e^-` (electron).
 * Group abbreviations (Me, Et, Ph, tBu, Cp, OTf, ...) expand to their atoms.
 */
export function parseFormula(text: string, options: FormulaOptions = {}): FormulaResult {
  const formula = text.trim();
  const suffix = splitFormulaSuffix(formula);
  if (!suffix.ok) return suffix;
  const { body, phase, notes } = suffix.value;
  let charge = suffix.value.charge;
  if (options.charge !== undefined) {
    if (charge !== null && charge !== options.charge) {
      return { ok: false, error: formulaError(formula, body.length, formula.slice(body.length), `written charge ${charge} disagrees with the given charge ${options.charge}`) };
    }
    charge = options.charge;
  }
  if (body === 'e') {
    // The electron of half-reactions: no atoms, charge −1 unless written otherwise.
    if (charge !== null && charge !== -1) return { ok: false, error: formulaError(formula, 0, formula, 'an electron has charge −1') };
    return { ok: true, value: { counts: {}, charge: -1, phase, notes } };
  }
  const parsed = parseFormulaBody(formula, body);
  if (!parsed.ok) return parsed;
  return { ok: true, value: { counts: parsed.counts, charge: charge ?? 0, phase, notes } };
}
