import { isElementSymbol } from './elements.ts';
import { formulaError, type FormulaError } from './formulaError.ts';

/** Phase written after a formula: gas, liquid, solid, crystal, aqueous solution. */
export type Phase = 'g' | 'l' | 's' | 'cr' | 'aq';

/** A formula with its phase and charge suffixes taken off. */
export interface FormulaSuffix {
  /** The formula body (still holding element counts). */
  body: string;
  phase: Phase | null;
  /** Charge written in the text; null when none was written. */
  charge: number | null;
  /** How an ambiguous bare charge was read, for the user to confirm. */
  notes: string[];
}

const PHASE = /\((g|l|s|cr|aq)\)$/;
const CARET = /\^\{?(?:(\d*)([+-]+)|([+-])(\d+))\}?$/;
const SUPERSCRIPT = /([⁰¹²³⁴⁵⁶⁷⁸⁹]*)([⁺⁻])$/;
const SPACED = /\s+(\d*)([+-])$/;
const BARE = /(\d*)([+-]+)$/;
const SUPER_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function signed(digits: string, signs: string): number {
  const magnitude = digits === '' ? signs.length : Number(digits);
  return signs[0] === '-' ? -magnitude : magnitude;
}

type SuffixResult = { ok: true; value: FormulaSuffix } | { ok: false; error: FormulaError };

/**
 * Strips a phase suffix ((g), (l), (s), (cr), (aq)) and a charge: `^+`, `^2-`, `^{3+}`, `⁺`, `²⁻`,
 * ` 2-` after a space, or a bare trailing sign (`NH4+`, `OH-`, `Fe2+`, `[Fe(CN)6]4-`).
 * A bare `n±` is a charge after `]` or a lone element symbol (Fe2+ is Fe²⁺, with a note);
 * after a polyatomic body one digit is an atom count (NH4+ is NH₄⁺), and longer digit runs
 * are refused as ambiguous (SO42-: write SO4^2-).
 */
export function splitFormulaSuffix(formula: string): SuffixResult {
  let body = formula.trim();
  const phaseMatch = PHASE.exec(body);
  const phase = phaseMatch ? (phaseMatch[1] as Phase) : null;
  if (phaseMatch) body = body.slice(0, phaseMatch.index).trimEnd();
  const notes: string[] = [];
  const done = (rest: string, charge: number | null): SuffixResult => ({ ok: true, value: { body: rest, phase, charge, notes } });

  const caretAt = body.lastIndexOf('^');
  if (caretAt >= 0) {
    const m = CARET.exec(body);
    if (!m || m.index !== caretAt) {
      return { ok: false, error: formulaError(formula, caretAt, body.slice(caretAt), "bad charge (expected e.g. '^+', '^2-')") };
    }
    const charge = m[2] !== undefined ? signed(m[1] ?? '', m[2]) : signed(m[4] ?? '', m[3] ?? '+');
    if (m[2] !== undefined && m[2].length > 1 && m[1] !== '') {
      return { ok: false, error: formulaError(formula, caretAt, body.slice(caretAt), 'bad charge') };
    }
    return done(body.slice(0, caretAt), charge);
  }
  const sup = SUPERSCRIPT.exec(body);
  if (sup) {
    const digits = [...(sup[1] ?? '')].map((c) => String(SUPER_DIGITS.indexOf(c))).join('');
    return done(body.slice(0, sup.index), signed(digits, sup[2] === '⁻' ? '-' : '+'));
  }
  const spaced = SPACED.exec(body);
  if (spaced) return done(body.slice(0, spaced.index), signed(spaced[1] ?? '', spaced[2] ?? '+'));
  const bare = BARE.exec(body);
  if (!bare) return done(body, null);
  const digits = bare[1] ?? '';
  const signs = bare[2] ?? '+';
  const before = body.slice(0, bare.index);
  if (digits === '') return done(before, signed('', signs));
  if (signs.length > 1) return { ok: false, error: formulaError(formula, bare.index, bare[0], 'bad charge') };
  if (before.endsWith(']')) return done(before, signed(digits, signs));
  if (isElementSymbol(before)) {
    notes.push(`read '${before}${digits}${signs}' as ${before} with charge ${digits}${signs}; write ${before}${digits}^${signs} for ${digits} atoms with charge 1${signs}`);
    return done(before, signed(digits, signs));
  }
  if (digits.length === 1) return done(before + digits, signed('', signs));
  return {
    ok: false,
    error: formulaError(formula, bare.index, bare[0], `ambiguous charge '${bare[0]}': write ${before}${digits.slice(0, -1)}^${digits.slice(-1)}${signs} or ${before}${digits}^${signs}`),
  };
}
