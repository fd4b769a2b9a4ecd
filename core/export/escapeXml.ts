/** Escapes text for XML content and double- or single-quoted attributes. */
export function escapeXml(text: string): string {
  // Most strings (colours, numbers, plain labels) need nothing: skip the replace for them.
  return SPECIAL.test(text) ? text.replace(SPECIALS, (c) => ESCAPES[c]!) : text;
}

const SPECIAL = /[&<>"']/;
const SPECIALS = /[&<>"']/g;
const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/** A number for SVG output: at most 3 decimals, no trailing zeros, no "-0". */
export function num(value: number): string {
  // k / 1000 prints as its shortest decimal, so this is toFixed(3) without trailing zeros, minus the regex.
  const r = Math.round(value * 1000) / 1000;
  return r === 0 ? '0' : String(r);
}
