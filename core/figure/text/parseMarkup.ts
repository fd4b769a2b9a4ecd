/** A piece of label text on the baseline, lowered (subscript) or raised (superscript). */
export interface Span {
  text: string;
  shift: 'base' | 'sub' | 'sup';
}

/** The characters that start markup. */
const PLAIN_BREAK = /[\\_^]/;

/**
 * Passline label markup — small on purpose:
 *
 * - `_2` lowers one character, `_{12}` lowers a group: `H_2O`, `C_{60}`
 * - `^+` raises one character, `^{2-}` raises a group: `Cu^{2+}`, `NH_4^+`
 * - `\` takes the next character literally: `\_`, `\^`, `\{`, `\}`, `\\`
 * - everything else is plain Unicode, so Greek (Δ, α), ‡, ° and arrows are typed as they are.
 *
 * Groups do not nest; an unclosed group runs to the end of the label; a lone `_` or `^`
 * at the end is kept as text. Parsing never fails.
 */
export function parseMarkup(source: string): Span[] {
  // Most labels have no markup at all: one baseline span, as the loop below would give.
  if (!PLAIN_BREAK.test(source)) return source ? [{ text: source, shift: 'base' }] : [];
  const spans: Span[] = [];
  const push = (text: string, shift: Span['shift']) => {
    if (!text) return;
    const last = spans[spans.length - 1];
    if (last && last.shift === shift) last.text += text;
    else spans.push({ text, shift });
  };
  const chars = [...source];
  let i = 0;
  while (i < chars.length) {
    const c = chars[i]!;
    if (c === '\\' && i + 1 < chars.length) {
      push(chars[i + 1]!, 'base');
      i += 2;
    } else if ((c === '_' || c === '^') && i + 1 < chars.length) {
      const shift = c === '_' ? 'sub' : 'sup';
      if (chars[i + 1] === '{') {
        const close = chars.indexOf('}', i + 2);
        const end = close < 0 ? chars.length : close;
        push(chars.slice(i + 2, end).join(''), shift);
        i = end + 1;
      } else {
        push(chars[i + 1]!, shift);
        i += 2;
      }
    } else {
      push(c, 'base');
      i += 1;
    }
  }
  return spans;
}
