/**
 * Characters that cannot leave the program as they are:
 * - C0 controls other than tab, line feed and carriage return, which XML 1.0 forbids
 *   (W3C XML 1.0, §2.2 "Char") and which PDF text strings cut at (NUL) — ESC among them,
 *   so no terminal escape sequence gets through;
 * - DEL and the C1 controls U+007F–U+009F (XML 1.0 §2.2 discourages them; U+009B is a
 *   terminal's one-byte CSI);
 * - the non-characters U+FFFE and U+FFFF and unpaired surrogates (not XML Chars).
 */
const UNSAFE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * Bidirectional embedding, override and isolate controls (Unicode UAX #9, §2.1–2.2:
 * LRE, RLE, PDF, LRO, RLO, LRI, RLI, FSI, PDI): they reverse or reorder a label's display.
 */
const BIDI = /[\u202A-\u202E\u2066-\u2069]/g;

/** Shown in place of a character that cannot be carried (U+FFFD REPLACEMENT CHARACTER). */
export const REPLACEMENT = '\uFFFD';

/**
 * Text safe for SVG (XML 1.0), PDF and a terminal: unsafe characters become U+FFFD,
 * bidirectional controls are dropped. Tabs and line breaks stay. Returns the same
 * string when nothing needs changing.
 */
export function safeText(text: string): string {
  UNSAFE.lastIndex = 0;
  BIDI.lastIndex = 0;
  if (!UNSAFE.test(text) && !BIDI.test(text)) return text;
  return text.replace(UNSAFE, REPLACEMENT).replace(BIDI, '');
}
