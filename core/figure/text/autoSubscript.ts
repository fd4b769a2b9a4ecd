import { ELEMENT_SYMBOLS, GROUP_ABBREVIATIONS } from './elements.ts';
import type { Span } from './parseMarkup.ts';

const TOKEN = /[A-Za-z0-9()[\]]+/g;
const DIATOMIC = new Set(['H', 'N', 'O', 'F', 'Cl', 'Br', 'I']);
const PART = /[A-Z][a-z]*|\d+|[()[\]]/g;

/**
 * Lowers the counts in words that read as chemical formulas (H2O, Pd(PPh3)4, CO2):
 * digits right after an element symbol, a common group abbreviation or a closing bracket.
 * A word that contains anything else (TS1, Int2, 2nd) is left alone, as are leading
 * coefficients. A lone symbol with a count (I1, B2, C3) is usually a state's name, so it
 * is lowered only for the common diatomic elements with count 2 (H2, N2, O2, Cl2, I2).
 * Only baseline spans are touched.
 */
export function autoSubscript(spans: readonly Span[]): Span[] {
  const out: Span[] = [];
  const push = (text: string, shift: Span['shift']) => {
    const last = out[out.length - 1];
    if (last && last.shift === shift) last.text += text;
    else if (text) out.push({ text, shift });
  };
  for (const span of spans) {
    if (span.shift !== 'base') {
      push(span.text, span.shift);
      continue;
    }
    let at = 0;
    for (const match of span.text.matchAll(TOKEN)) {
      push(span.text.slice(at, match.index), 'base');
      for (const piece of splitFormula(match[0])) push(piece.text, piece.shift);
      at = match.index + match[0].length;
    }
    push(span.text.slice(at), 'base');
  }
  return out;
}

function splitFormula(word: string): Span[] {
  const parts = word.match(PART) ?? [];
  if (parts.join('') !== word || !/\d/.test(word)) return [{ text: word, shift: 'base' }];
  if (parts.length === 2 && !(DIATOMIC.has(parts[0]!) && parts[1] === '2')) return [{ text: word, shift: 'base' }];
  const out: Span[] = [];
  let previous = '';
  for (const part of parts) {
    if (/^\d/.test(part)) {
      const countable = previous !== '' && previous !== '(' && previous !== '[' && !/^\d/.test(previous);
      out.push({ text: part, shift: countable ? 'sub' : 'base' });
    } else if (/^[A-Z]/.test(part) && !ELEMENT_SYMBOLS.has(part) && !GROUP_ABBREVIATIONS.has(part)) {
      return [{ text: word, shift: 'base' }];
    } else {
      out.push({ text: part, shift: 'base' });
    }
    previous = part;
  }
  return out;
}
